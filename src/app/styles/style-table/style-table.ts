import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { StyleTarget } from '@shared/recipes';

/** The co-op's own style list with each style's ranges. */
@Component({
  selector: 'cw-style-table',
  imports: [MatButton, DecimalPipe],
  template: `
    <div class="scroller" role="region" aria-label="Styles" tabindex="0">
      <table class="table">
        <thead>
          <tr>
            <th scope="col">Style</th><th scope="col">OG</th><th scope="col">FG</th><th scope="col">ABV</th><th scope="col">IBU</th><th scope="col">SRM</th>
            @if (canEdit()) {
              <th scope="col"><span class="cw-visually-hidden">Actions</span></th>
            }
          </tr>
        </thead>
        <tbody>
          @for (style of styles(); track style.id) {
            <tr>
              <th scope="row">{{ style.name }}</th>
              <td>{{ style.og.min | number: '1.3-3' }}–{{ style.og.max | number: '1.3-3' }}</td>
              <td>{{ style.fg.min | number: '1.3-3' }}–{{ style.fg.max | number: '1.3-3' }}</td>
              <td>{{ style.abv.min }}–{{ style.abv.max }} %</td>
              <td>{{ style.ibu.min }}–{{ style.ibu.max }}</td>
              <td>{{ style.colourSrm.min }}–{{ style.colourSrm.max }}</td>
              @if (canEdit()) {
                <td><button mat-button type="button" [attr.aria-label]="'Edit ' + style.name" (click)="editRequested.emit(style)">Edit</button></td>
              }
            </tr>
          } @empty {
            <tr><td colspan="7">No styles yet.</td></tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: '../../recipes/recipe-table/recipe-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StyleTable {
  readonly styles = input.required<readonly StyleTarget[]>();
  readonly canEdit = input(false);
  readonly editRequested = output<StyleTarget>();
}
