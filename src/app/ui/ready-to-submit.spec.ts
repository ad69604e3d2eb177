import { FormControl, FormGroup, Validators } from '@angular/forms';
import { readyToSubmit } from './ready-to-submit';

describe('readyToSubmit', () => {
  const form = () => new FormGroup({ name: new FormControl('', Validators.required), note: new FormControl('') });

  it('lets a valid form through when nothing is in flight', () => {
    const valid = form();
    valid.setValue({ name: 'Batch 12', note: '' });
    expect(readyToSubmit(valid)).toBe(true);
    expect(readyToSubmit(valid, false)).toBe(true);
  });

  it('holds an invalid form back and marks every field touched, so each shows its message', () => {
    const invalid = form();
    expect(readyToSubmit(invalid)).toBe(false);
    expect(invalid.controls.name.touched).toBe(true);
    expect(invalid.controls.note.touched).toBe(true);
  });

  it('ignores a second press while the request is in flight, without marking fields', () => {
    const valid = form();
    valid.setValue({ name: 'Batch 12', note: '' });
    expect(readyToSubmit(valid, true)).toBe(false);
    const invalid = form();
    expect(readyToSubmit(invalid, true)).toBe(false);
    expect(invalid.controls.name.touched).toBe(false);
  });
});
