import { ComponentFixture, TestBed } from '@angular/core/testing';
import { CreateInvitationRequest } from '@shared/members';
import { InviteForm } from './invite-form';

describe('InviteForm', () => {
  let fixture: ComponentFixture<InviteForm>;
  let element: HTMLElement;
  let emitted: CreateInvitationRequest[];

  beforeEach(async () => {
    fixture = TestBed.createComponent(InviteForm);
    element = fixture.nativeElement as HTMLElement;
    emitted = [];
    fixture.componentInstance.invitationSubmitted.subscribe((request) => emitted.push(request));
    await fixture.whenStable();
  });

  function typeEmail(value: string): void {
    const input = element.querySelector<HTMLInputElement>('input[type="email"]')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  }

  const checkbox = (role: string) =>
    [...element.querySelectorAll<HTMLInputElement>('input[type="checkbox"]')].find(
      (input) => input.closest('mat-checkbox')?.textContent?.trim() === role,
    )!;
  const send = async () => {
    [...element.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Send invitation')!.click();
    await fixture.whenStable();
  };

  it('starts with only the member role ticked', () => {
    expect([checkbox('member').checked, checkbox('brewer').checked, checkbox('admin').checked]).toEqual([true, false, false]);
  });

  it('emits the e-mail and the ticked roles', async () => {
    typeEmail('tomas.lindqvist@fernhollow.example');
    checkbox('brewer').click();

    await send();

    expect(emitted).toEqual([{ email: 'tomas.lindqvist@fernhollow.example', roles: ['member', 'brewer'] }]);
  });

  it('asks for a role and emits nothing when every role is unticked', async () => {
    typeEmail('someone@fernhollow.example');
    checkbox('member').click();

    await send();

    expect(emitted).toEqual([]);
    expect(element.textContent).toContain('Choose at least one role.');
  });

  it('shows the reason the server gave for the e-mail at the field', async () => {
    typeEmail('someone@fernhollow.example');

    fixture.componentRef.setInput('fieldErrors', { email: 'This person is already a member.' });
    await fixture.whenStable();

    expect(element.querySelector('mat-error')?.textContent).toContain('This person is already a member.');
  });

  it('clears itself when an invitation has been created', async () => {
    typeEmail('someone@fernhollow.example');
    fixture.componentRef.setInput('createdCount', 1);
    await fixture.whenStable();

    expect(element.querySelector<HTMLInputElement>('input[type="email"]')!.value).toBe('');
  });
});
