import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

/** Shown to a signed-in person who opened an area their roles do not cover. */
@Component({
  selector: 'cw-not-allowed-page',
  imports: [RouterLink],
  template: `
    <section class="cw-page">
      <h1>Not allowed</h1>
      <p>This area is open to other roles than yours. If you need it, ask one of the co-op's admins.</p>
      <p><a routerLink="/today">Back to Today</a></p>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotAllowedPage {}
