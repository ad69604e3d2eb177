import { Injectable, inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { map, Observable } from 'rxjs';
import { ConfirmDialog, ConfirmQuestion } from './confirm-dialog/confirm-dialog';

/** Opens the confirmation dialog; emits true only when the person chose the action, false on cancel or Escape. */
@Injectable({ providedIn: 'root' })
export class Confirmation {
  private readonly dialog = inject(MatDialog);

  ask(question: ConfirmQuestion): Observable<boolean> {
    return this.dialog
      .open<ConfirmDialog, ConfirmQuestion, boolean>(ConfirmDialog, { data: question, role: 'alertdialog', maxWidth: '480px', autoFocus: 'dialog' })
      .afterClosed()
      .pipe(map((answer) => answer === true));
  }
}
