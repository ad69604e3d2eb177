import { ChangeDetectionStrategy, Component } from '@angular/core';

/** The frame of the signed-out pages: the product name above a narrow main column. */
@Component({
  selector: 'cw-public-frame',
  template: `
    <header class="brand">
      <img src="favicon.svg" alt="" width="40" height="40" />
      <span>Commonwort</span>
    </header>
    <main class="column"><ng-content /></main>
  `,
  styleUrl: './public-frame.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublicFrame {}
