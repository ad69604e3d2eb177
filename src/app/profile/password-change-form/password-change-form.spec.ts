import { ComponentFixture, TestBed } from '@angular/core/testing';
import { ChangePasswordRequest } from '@shared/profile';
import { PasswordChangeForm } from './password-change-form';

describe('PasswordChangeForm', () => {
  let fixture: ComponentFixture<PasswordChangeForm>;
  let element: HTMLElement;

  const FIELDS = ['currentPassword', 'password', 'confirm'];
  const field = (name: string) => element.querySelectorAll<HTMLInputElement>('input[type="password"]')[FIELDS.indexOf(name)];

  async function type(name: string, value: string): Promise<void> {
    field(name).value = value;
    field(name).dispatchEvent(new Event('input'));
    await fixture.whenStable();
  }

  beforeEach(async () => {
    TestBed.configureTestingModule({ imports: [PasswordChangeForm] });
    fixture = TestBed.createComponent(PasswordChangeForm);
    element = fixture.nativeElement as HTMLElement;
    await fixture.whenStable();
  });

  it('asks for the current password before sending the new one', async () => {
    const sent: ChangePasswordRequest[] = [];
    fixture.componentInstance.submitted.subscribe((request) => sent.push(request));
    await type('password', 'a new passphrase');
    await type('confirm', 'a new passphrase');

    element.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    expect(sent).toEqual([]);
    expect(element.textContent).toContain('Enter your current password.');

    await type('currentPassword', 'the old one');
    element.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
    await fixture.whenStable();
    expect(sent).toEqual([{ currentPassword: 'the old one', newPassword: 'a new passphrase' }]);
  }, 20_000);

  it('shows the server refusal of the current password at that field', async () => {
    await type('currentPassword', 'a guess');
    fixture.componentRef.setInput('fieldErrors', { currentPassword: 'does not match your password' });
    await fixture.whenStable();

    expect(element.textContent).toContain('The current password does not match your password.');
  });
});
