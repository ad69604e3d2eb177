import { FormControl, FormGroup } from '@angular/forms';
import { applyServerFieldErrors } from './server-field-errors';

describe('applyServerFieldErrors', () => {
  it('sets the reason as a server error on the named control and marks it touched', () => {
    const form = new FormGroup({ email: new FormControl('a@b'), password: new FormControl('x') });

    applyServerFieldErrors(form, { email: 'Give a full e-mail address.', unknown: 'ignored' });

    expect(form.controls.email.getError('server')).toBe('Give a full e-mail address.');
    expect(form.controls.email.touched).toBe(true);
    expect(form.controls.password.errors).toBeNull();
  });

  it('lets the server error go once the field is edited', () => {
    const form = new FormGroup({ email: new FormControl('a@b') });
    applyServerFieldErrors(form, { email: 'Give a full e-mail address.' });

    form.controls.email.setValue('a@b.example');

    expect(form.controls.email.errors).toBeNull();
  });

  it('puts a field the API names otherwise on the control it is mapped to', () => {
    const form = new FormGroup({ startDate: new FormControl(null), note: new FormControl('') });

    applyServerFieldErrors(form, { start: 'Must not be in the past.', note: 'Too long.' }, { start: 'startDate' });

    expect(form.controls.startDate.getError('server')).toBe('Must not be in the past.');
    expect(form.controls.note.getError('server')).toBe('Too long.');
  });
});
