import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { Session } from './session';

/**
 * When a signed-in call answers 401 the session has ended on the server: forget the user and
 * send them to sign in, coming back to the same screen afterwards. Calls to /api/session answer
 * 401 as part of their meaning (wrong password, not signed in) and are left to their callers.
 */
export const sessionExpiryInterceptor: HttpInterceptorFn = (req, next) => {
  if (!req.url.startsWith('/api/') || req.url.startsWith('/api/session')) return next(req);
  const session = inject(Session);
  const router = inject(Router);
  return next(req).pipe(
    catchError((err: unknown) => {
      if (err instanceof HttpErrorResponse && err.status === 401 && session.signedIn()) {
        session.forget();
        void router.navigate(['/sign-in'], { queryParams: { returnUrl: router.url } });
      }
      return throwError(() => err);
    }),
  );
};
