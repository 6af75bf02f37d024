import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { catchError, map, of } from 'rxjs';

import { Notifier } from '../core/notifier';
import { toProblem } from '../core/problem';
import { TeamStore } from './team-store';

/**
 * Makes the route's `:teamId` the current team. A team the user does not belong to
 * (or no longer does) sends them to the start page with a message.
 */
export const teamGuard: CanActivateFn = (route) => {
  const teamStore = inject(TeamStore);
  const router = inject(Router);
  const notifier = inject(Notifier);
  const teamId = route.paramMap.get('teamId') ?? '';
  return teamStore.ensureLoaded().pipe(
    map((teams) => {
      if (teams.some((team) => team.id === teamId)) {
        teamStore.select(teamId);
        return true;
      }
      notifier.problem({
        type: 'about:blank',
        title: 'Team not found',
        status: 404,
        detail: 'You are not a member of that team. Pick one of your teams, or ask its owner for an invitation.',
        code: 'TEAM_NOT_FOUND',
      });
      return router.createUrlTree(['/']);
    }),
    catchError((error: unknown) => {
      const problem = toProblem(error);
      if (problem.status === 401) {
        // The interceptor has ended the session and is routing to sign-in.
        return of(false);
      }
      notifier.problem(problem);
      return of(router.createUrlTree(['/']));
    }),
  );
};
