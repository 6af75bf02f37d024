import { Injectable, inject } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import type { Problem } from '@tallus/contracts';

import { describeProblem } from './error-messages';

/** Short messages at the bottom of the screen: outcomes of actions and problems that belong to no field. */
@Injectable({ providedIn: 'root' })
export class Notifier {
  private readonly snackBar = inject(MatSnackBar);

  /**
   * Confirms that an action worked.
   *
   * @param message what happened, e.g. "Invitation sent to a@b.org"
   */
  success(message: string): void {
    this.snackBar.open(message, 'OK', { duration: 4000, panelClass: 'tl-snack-success' });
  }

  /**
   * Says that something did not work but the page still does, and what that means for the user.
   *
   * @param message the consequence in plain words
   */
  warning(message: string): void {
    this.snackBar.open(message, 'Dismiss', { duration: 8000, panelClass: 'tl-snack-error' });
  }

  /**
   * Shows a problem that has no field to show it at; stays until dismissed for long texts.
   *
   * @param problem the parsed problem
   */
  problem(problem: Problem): void {
    this.snackBar.open(describeProblem(problem), 'Dismiss', {
      duration: 8000,
      panelClass: 'tl-snack-error',
      politeness: 'assertive',
    });
  }
}
