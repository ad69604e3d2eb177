import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogActions, MatDialogClose, MatDialogContent, MatDialogTitle } from '@angular/material/dialog';

/** What a confirmation asks; `lockout` marks a question whose yes takes access away from the person asking. */
export interface ConfirmQuestion {
  title: string;
  message: string;
  confirmLabel: string;
  lockout?: boolean;
}

/** The same question under the name the batch pages use. */
export type ConfirmDialogData = ConfirmQuestion;

/** Asks before an action that locks someone out or cannot be undone; closes with true only on the explicit yes. */
@Component({
  selector: 'cw-confirm-dialog',
  imports: [MatDialogTitle, MatDialogContent, MatDialogActions, MatDialogClose, MatButton],
  template: `
    <h2 mat-dialog-title>{{ question.title }}</h2>
    <mat-dialog-content>
      <p [class.lockout]="question.lockout">{{ question.message }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" cdkFocusInitial>Cancel</button>
      <button mat-flat-button type="button" class="confirm" [mat-dialog-close]="true">{{ question.confirmLabel }}</button>
    </mat-dialog-actions>
  `,
  styles: '.lockout { font-weight: 700; color: var(--mat-sys-error); } .confirm { --mat-button-filled-container-color: var(--mat-sys-error); --mat-button-filled-label-text-color: var(--mat-sys-on-error); }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmDialog {
  protected readonly question = inject<ConfirmQuestion>(MAT_DIALOG_DATA);
}
