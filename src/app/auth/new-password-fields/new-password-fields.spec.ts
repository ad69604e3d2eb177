import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { NonNullableFormBuilder, Validators } from '@angular/forms';
import { inject } from '@angular/core';
import { PASSWORD_MIN_LENGTH } from '@shared/auth';
import { confirmPasswordValidator } from '../confirm-password-validator';
import { NewPasswordFields } from './new-password-fields';

@Component({
  imports: [NewPasswordFields],
  template: `<cw-new-password-fields label="New password" [password]="form.controls.password" [confirm]="form.controls.confirm" />`,
})
class Host {
  readonly form = inject(NonNullableFormBuilder).group({
    password: ['', [Validators.required, Validators.minLength(PASSWORD_MIN_LENGTH)]],
    confirm: ['', [Validators.required, confirmPasswordValidator]],
  });
}

describe('NewPasswordFields', () => {
  async function render() {
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    return fixture;
  }

  it('when shown, then it labels both fields, the first with the given label', async () => {
    const text = (await render()).nativeElement.textContent as string;
    expect(text).toContain('New password');
    expect(text).toContain('Confirm password');
  });

  it('when the confirmation differs and the fields were touched, then it says the passwords differ', async () => {
    const fixture = await render();
    const { form } = fixture.componentInstance;
    form.setValue({ password: 'a long enough password', confirm: 'something else entirely' });
    form.controls.confirm.updateValueAndValidity();
    form.markAllAsTouched();
    fixture.detectChanges();
    await fixture.whenStable();
    expect(fixture.nativeElement.textContent).toContain('The two passwords differ.');
  });
});
