import { ErrorHandler, inject, Injectable, Injector } from '@angular/core';
import { Notifier } from './notifier';

/** Logs every error nobody else handled and tells the person, without details they cannot act on. */
@Injectable()
export class AppErrorHandler implements ErrorHandler {
  // Resolved on use: an error may arrive before the notifier's own dependencies exist.
  private readonly injector = inject(Injector);

  handleError(error: unknown): void {
    console.error(error);
    try {
      this.injector.get(Notifier).notify('Something went wrong. If it keeps happening, reload the page.', 8000);
    } catch (reportError) {
      console.error(reportError);
    }
  }
}
