import { ErrorHandler, Injectable, inject } from '@angular/core';

import { Notifier } from './notifier';
import { toProblem } from './problem';

/**
 * Last stop for errors nobody expected (a bug, a failed lazy chunk). Expected API
 * failures are handled where the call is made; this one logs the error for developers
 * and tells the user in words instead of failing silently.
 */
@Injectable()
export class GlobalErrorHandler implements ErrorHandler {
  private readonly notifier = inject(Notifier);

  handleError(error: unknown): void {
    console.error(error);
    const problem = toProblem(error);
    this.notifier.problem({
      ...problem,
      detail: isChunkLoadError(error)
        ? 'Tallus was updated. Reload the page to load the new version.'
        : 'Something went wrong in Tallus. Reload the page; if it happens again, note what you did and tell your administrator.',
    });
  }
}

function isChunkLoadError(error: unknown): boolean {
  return error instanceof Error && /dynamically imported module|Loading chunk/i.test(error.message);
}
