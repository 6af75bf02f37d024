import { inject } from '@angular/core';
import { CanMatchFn, Router } from '@angular/router';

import { AuthStore } from '../auth/auth-store';

/**
 * Lets signed-in users in; sends everyone else to sign-in with the URL they wanted,
 * so that an invitation link still works after signing in or creating an account.
 */
export const signedInGuard: CanMatchFn = (_route, segments) => {
  const router = inject(Router);
  if (inject(AuthStore).isSignedIn()) {
    return true;
  }
  // canMatch runs before the navigation's URL becomes router.url: rebuild it from the
  // navigation that is under way, which keeps the query (an invitation's token).
  const wanted = router.currentNavigation()?.extractedUrl;
  const returnUrl = wanted ? router.serializeUrl(wanted) : '/' + segments.map((s) => s.path).join('/');
  return router.createUrlTree(['/sign-in'], returnUrl === '/' ? {} : { queryParams: { returnUrl } });
};

/** Keeps signed-in users away from sign-in and registration. */
export const signedOutGuard: CanMatchFn = () => {
  const router = inject(Router);
  return inject(AuthStore).isSignedIn() ? router.createUrlTree(['/']) : true;
};

/**
 * The URL to go to after signing in: the `returnUrl` query parameter when it is a path
 * of this app, else the start page. Anything else (another origin, `//host`) is ignored.
 *
 * @param returnUrl the raw query parameter
 */
export function safeReturnUrl(returnUrl: string | null | undefined): string {
  if (!returnUrl || !returnUrl.startsWith('/') || returnUrl.startsWith('//') || returnUrl.includes('\\')) {
    return '/';
  }
  return returnUrl;
}
