import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { catchError, map, of } from 'rxjs';

import { TeamStore } from '../team-store';

/**
 * The start page opens the team the user last worked in (or their first team); only
 * users without any team see the welcome page.
 */
export const preferredTeamGuard: CanActivateFn = () => {
  const teamStore = inject(TeamStore);
  const router = inject(Router);
  return teamStore.ensureLoaded().pipe(
    map(() => {
      const team = teamStore.preferredTeam();
      return team ? router.createUrlTree(['/teams', team.id]) : true;
    }),
    // The welcome page shows the failure and lets the user retry.
    catchError(() => of(true)),
  );
};
