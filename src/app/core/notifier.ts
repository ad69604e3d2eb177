import { Injectable, Injector, inject } from '@angular/core';

const DEFAULT_DURATION_MS = 6000;

/**
 * Shows a short message in a snack bar. The snack bar's code is loaded on first use, which keeps it
 * (and the overlay it needs) out of the initial bundle.
 */
@Injectable({ providedIn: 'root' })
export class Notifier {
  private readonly injector = inject(Injector);

  /** Shows `message` with a Dismiss action for `durationMs`. */
  notify(message: string, durationMs = DEFAULT_DURATION_MS): void {
    import('@angular/material/snack-bar')
      .then(({ MatSnackBar }) => this.injector.get(MatSnackBar).open(message, 'Dismiss', { duration: durationMs }))
      .catch((error: unknown) => console.error(error));
  }
}
