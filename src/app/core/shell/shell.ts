import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatIconButton } from '@angular/material/button';
import { MatIcon } from '@angular/material/icon';
import { MatSidenav, MatSidenavContainer, MatSidenavContent } from '@angular/material/sidenav';
import { MatToolbar } from '@angular/material/toolbar';
import { RouterLink, RouterOutlet } from '@angular/router';
import { Store } from '@ngrx/store';
import { map } from 'rxjs';
import { authFeature } from '@app/auth/state/auth.feature';
import { NavList } from '../nav-list/nav-list';
import { selectVisibleNavItems } from '../nav.selectors';
import { UserMenu } from '../user-menu/user-menu';
import { ShellActions } from './shell.actions';

/** Below this width the navigation is a drawer that slides over the page. */
const HANDSET_QUERY = '(max-width: 959.98px)';

/** The signed-in frame: top bar, navigation and the page's main landmark. */
@Component({
  selector: 'cw-shell',
  imports: [
    MatToolbar,
    MatIconButton,
    MatIcon,
    MatSidenav,
    MatSidenavContainer,
    MatSidenavContent,
    RouterLink,
    RouterOutlet,
    NavList,
    UserMenu,
  ],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly store = inject(Store);

  protected readonly user = this.store.selectSignal(authFeature.selectUser);
  protected readonly navItems = this.store.selectSignal(selectVisibleNavItems);
  protected readonly isHandset = toSignal(
    inject(BreakpointObserver)
      .observe(HANDSET_QUERY)
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );

  protected closeDrawerOnHandset(drawer: MatSidenav): void {
    if (this.isHandset()) {
      void drawer.close();
    }
  }

  protected signOut(): void {
    this.store.dispatch(ShellActions.signOutClicked());
  }
}
