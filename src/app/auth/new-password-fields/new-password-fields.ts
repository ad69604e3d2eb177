import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { PASSWORD_MIN_LENGTH } from '@shared/auth';

/** A new password and its confirmation, with the messages every such form shows. */
@Component({
  selector: 'cw-new-password-fields',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatHint, MatError, MatInput],
  templateUrl: './new-password-fields.html',
  host: { class: 'cw-new-password-fields' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewPasswordFields {
  readonly password = input.required<FormControl<string>>();
  readonly confirm = input.required<FormControl<string>>();
  readonly label = input('Password');

  protected readonly minLength = PASSWORD_MIN_LENGTH;
}
