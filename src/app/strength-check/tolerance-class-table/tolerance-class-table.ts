import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { ToleranceClass } from '@shared/strength-check';

/** The product classes with their tolerances; admins pick one to change. */
@Component({
  selector: 'cw-tolerance-class-table',
  imports: [DecimalPipe, MatButton],
  template: `
    @if (classes().length === 0) {
      <p>No product classes yet{{ canEdit() ? '; add the ones your labelling rules name.' : '; an admin sets them.' }}</p>
    } @else {
      <table class="classes">
        <thead><tr><th scope="col">Product class</th><th scope="col">Tolerance</th><th scope="col">Note</th>@if (canEdit()) {<th scope="col"><span class="cw-visually-hidden">Actions</span></th>}</tr></thead>
        <tbody>
          @for (c of classes(); track c.id) {
            <tr [class.retired]="c.retired">
              <th scope="row">{{ c.name }}@if (c.retired) { (retired)}</th>
              <td>± {{ c.tolerancePercentVolume | number: '1.2-2' }} % vol</td>
              <td>{{ c.note }}</td>
              @if (canEdit()) {<td><button mat-button type="button" (click)="editRequested.emit(c)">Change<span class="cw-visually-hidden"> {{ c.name }}</span></button></td>}
            </tr>
          }
        </tbody>
      </table>
    }
  `,
  styles: `
    .classes { border-collapse: collapse; width: 100%; }
    th, td { text-align: left; padding: 6px 8px; border-bottom: 1px solid var(--mat-sys-outline-variant); }
    .retired { color: var(--mat-sys-on-surface-variant); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ToleranceClassTable {
  readonly classes = input.required<ToleranceClass[]>();
  readonly canEdit = input(false);
  readonly editRequested = output<ToleranceClass>();
}
