import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';

import { AuthStore } from '../auth/auth-store';

/**
 * Adds the session's bearer token to every call of Tallus's own API, and ends the
 * session when the API answers 401 to a call that carried one (token expired or revoked):
 * the user lands on sign-in and comes back to the same page afterwards.
 * A 401 to a call without token (a wrong password at sign-in) is left to the caller.
 */
export const authInterceptor: HttpInterceptorFn = (request, next) => {
  const authStore = inject(AuthStore);
  const router = inject(Router);
  const token = authStore.token();
  if (!isApiCall(request.url) || token === null) {
    return next(request);
  }
  const authorised = request.clone({ setHeaders: { Authorization: `Bearer ${token}` } });
  return next(authorised).pipe(
    catchError((error: unknown) => {
      if (error instanceof HttpErrorResponse && error.status === 401) {
        authStore.clearSession();
        // During a navigation (a guard loading data) the page the user wants is its target, not router.url.
        const navigation = router.currentNavigation();
        const returnUrl = navigation ? router.serializeUrl(navigation.extractedUrl) : router.url;
        void router.navigate(['/sign-in'], {
          queryParams: returnUrl.startsWith('/sign-in') ? {} : { returnUrl, expired: 1 },
        });
      }
      return throwError(() => error);
    }),
  );
};

function isApiCall(url: string): boolean {
  return url.startsWith('/api/') || url === '/api';
}
