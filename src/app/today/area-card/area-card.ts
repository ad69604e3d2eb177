import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { NavItem } from '@app/core/nav-items';

/** A short card that opens one area of the app. */
@Component({
  selector: 'cw-area-card',
  imports: [RouterLink, MatIcon],
  template: `
    <a class="card" [routerLink]="area().path">
      <mat-icon aria-hidden="true">{{ area().icon }}</mat-icon>
      <span class="text">
        <span class="title">{{ area().label }}</span>
        <span class="summary">{{ area().summary }}</span>
      </span>
    </a>
  `,
  styleUrl: './area-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AreaCard {
  readonly area = input.required<NavItem>();
}
