import { Routes } from '@angular/router';

import { signedInGuard, signedOutGuard } from './core/auth-guard';
import { teamGuard } from './teams/team-guard';
import { preferredTeamGuard } from './teams/welcome/preferred-team-guard';

/** Every screen of Tallus. Team sections live under `/teams/:teamId/`. */
export const routes: Routes = [
  {
    path: 'sign-in',
    canMatch: [signedOutGuard],
    title: 'Sign in · Tallus',
    loadComponent: () => import('./auth/sign-in/sign-in').then((m) => m.SignIn),
  },
  {
    path: 'register',
    canMatch: [signedOutGuard],
    title: 'Create account · Tallus',
    loadComponent: () => import('./auth/register/register').then((m) => m.Register),
  },
  {
    path: '',
    canMatch: [signedInGuard],
    loadComponent: () => import('./core/shell/shell').then((m) => m.Shell),
    children: [
      {
        path: '',
        pathMatch: 'full',
        title: 'Tallus',
        canActivate: [preferredTeamGuard],
        loadComponent: () => import('./teams/welcome/welcome').then((m) => m.Welcome),
      },
      {
        path: 'teams/:teamId',
        canActivate: [teamGuard],
        children: [
          {
            path: '',
            pathMatch: 'full',
            title: 'Team · Tallus',
            loadComponent: () => import('./teams/team-home/team-home').then((m) => m.TeamHome),
          },
          {
            path: 'reaction-sets/:setId',
            title: 'Reaction set · Tallus',
            loadComponent: () => import('./reaction-sets/set-editor/set-editor').then((m) => m.SetEditor),
          },
          {
            path: 'species',
            title: 'Species catalogue · Tallus',
            loadComponent: () => import('./species/species-catalogue/species-catalogue').then((m) => m.SpeciesCatalogue),
          },
          {
            path: 'library',
            title: 'Library · Tallus',
            loadComponent: () => import('./library/library-page/library-page').then((m) => m.LibraryPage),
          },
          {
            path: 'water-analyses',
            title: 'Water analyses · Tallus',
            loadComponent: () => import('./water/water-list/water-list').then((m) => m.WaterList),
          },
          {
            path: 'water-analyses/:analysisId',
            title: 'Water analysis · Tallus',
            loadComponent: () => import('./water/water-editor/water-editor').then((m) => m.WaterEditor),
          },
          {
            path: 'mass-balance',
            title: 'Mass-balance models · Tallus',
            loadComponent: () => import('./mass-balance/model-list/model-list').then((m) => m.ModelList),
          },
          {
            path: 'mass-balance/:modelId',
            title: 'Mass-balance model · Tallus',
            loadComponent: () => import('./mass-balance/model-editor/model-editor').then((m) => m.ModelEditor),
          },
          {
            path: 'mineral-formulas',
            title: 'Mineral formulas · Tallus',
            loadComponent: () => import('./mineral-formulas/formula-page/formula-page').then((m) => m.FormulaPage),
          },
          {
            path: 'rock-samples',
            title: 'Rock samples · Tallus',
            loadComponent: () => import('./rock-samples/rock-samples-page/rock-samples-page').then((m) => m.RockSamplesPage),
          },
          {
            path: 'reports',
            title: 'Reports · Tallus',
            loadComponent: () => import('./reports/reports-page/reports-page').then((m) => m.ReportsPage),
          },
          {
            path: 'members',
            title: 'Members · Tallus',
            loadComponent: () => import('./teams/members/members').then((m) => m.Members),
          },
        ],
      },
      {
        path: 'invitations/accept',
        title: 'Accept invitation · Tallus',
        loadComponent: () =>
          import('./auth/accept-invitation/accept-invitation').then((m) => m.AcceptInvitation),
      },
      {
        path: 'dev/outbox',
        title: 'Outbox · Tallus',
        loadComponent: () => import('./dev/outbox/outbox').then((m) => m.Outbox),
      },
    ],
  },
  { path: '**', redirectTo: '' },
];
