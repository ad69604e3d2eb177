import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { AbstractControl, NonNullableFormBuilder, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatCheckbox } from '@angular/material/checkbox';
import { MatError, MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { Role, ROLES } from '@shared/auth';
import { CreateInvitationRequest } from '@shared/members';
import { applyServerFieldErrors, FieldErrors } from '@app/ui/server-field-errors';
import { onCountChange } from '@app/ui/on-count-change';

const DEFAULT_ROLES = { member: true, brewer: false, admin: false } satisfies Record<Role, boolean>;

function atLeastOneRole(group: AbstractControl): ValidationErrors | null {
  return Object.values(group.value as Record<Role, boolean>).some(Boolean) ? null : { noRole: true };
}

/** E-mail and roles of a person to invite; new invitations hold the member role unless changed. */
@Component({
  selector: 'cw-invite-form',
  imports: [ReactiveFormsModule, MatFormField, MatLabel, MatError, MatInput, MatCheckbox, MatButton],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InviteForm {
  readonly pending = input(false);
  /** Goes up by one per invitation created; the form then clears for the next one. */
  readonly createdCount = input(0);
  readonly fieldErrors = input<FieldErrors | null>(null);
  readonly invitationSubmitted = output<CreateInvitationRequest>();

  protected readonly roleNames = ROLES;
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    roles: inject(NonNullableFormBuilder).group({ ...DEFAULT_ROLES }, { validators: atLeastOneRole }),
  });

  constructor() {
    effect(() => applyServerFieldErrors(this.form, this.fieldErrors()));
    onCountChange(this.createdCount, () => this.form.reset({ email: '', roles: { ...DEFAULT_ROLES } }));
  }

  protected submit(): void {
    if (this.pending()) {
      return;
    }
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const { email, roles } = this.form.getRawValue();
    this.invitationSubmitted.emit({ email: email.trim(), roles: ROLES.filter((role) => roles[role]) });
  }
}
