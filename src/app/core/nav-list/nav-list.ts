import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatIcon } from '@angular/material/icon';
import { MatListItem, MatListItemIcon, MatListItemTitle, MatNavList } from '@angular/material/list';
import { RouterLink, RouterLinkActive } from '@angular/router';
import { NavItem } from '../nav-items';

/** The list of areas in the side navigation. */
@Component({
  selector: 'cw-nav-list',
  imports: [MatNavList, MatListItem, MatListItemIcon, MatListItemTitle, MatIcon, RouterLink, RouterLinkActive],
  templateUrl: './nav-list.html',
  styleUrl: './nav-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NavList {
  readonly items = input.required<readonly NavItem[]>();
  readonly navigated = output<void>();
}
