import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

/** Shown for an address the app does not know. */
@Component({
  selector: 'cw-not-found-page',
  imports: [RouterLink],
  template: `
    <section class="cw-page">
      <h1>Page not found</h1>
      <p>There is no page at this address.</p>
      <p><a routerLink="/today">Back to Today</a></p>
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
