import { HttpErrorResponse, HttpEvent, HttpHandlerFn, HttpInterceptorFn, HttpRequest, HttpResponse } from '@angular/common/http';
import { inject } from '@angular/core';
import { Observable, catchError, filter, map, of, switchMap, tap, throwError } from 'rxjs';
import * as z from 'zod';
import { ApiError } from '@shared/contracts/errors';
import { CsrfToken } from './csrf-token';

export const CSRF_HEADER = 'x-csrf-token';
const CsrfResponse = z.object({ csrfToken: z.string().min(1) });
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Adds the anti-forgery header to every state-changing call to our own API. Fetches a token
 * first when none is held yet, and when the API rejects the token (403, code "csrf": the session
 * was renewed) fetches a fresh one and retries exactly once.
 */
export const csrfInterceptor: HttpInterceptorFn = (req, next) => {
  if (SAFE_METHODS.has(req.method) || !req.url.startsWith('/api/')) return next(req);
  const csrf = inject(CsrfToken);
  const send = (token: string) => next(req.clone({ setHeaders: { [CSRF_HEADER]: token } }));
  const fresh = () => fetchToken(next).pipe(tap((token) => csrf.set(token)));
  const held = csrf.value();
  return (held ? of(held) : fresh()).pipe(
    switchMap(send),
    catchError((err: unknown) => (isCsrfRejection(err) ? fresh().pipe(switchMap(send)) : throwError(() => err))),
  );
};

// Sent through `next` rather than HttpClient: a GET needs no token, and this keeps the
// interceptor free of a dependency on the client that calls it.
function fetchToken(next: HttpHandlerFn): Observable<string> {
  return next(new HttpRequest('GET', '/api/csrf')).pipe(
    filter((event: HttpEvent<unknown>): event is HttpResponse<unknown> => event instanceof HttpResponse),
    map((response) => CsrfResponse.parse(response.body).csrfToken),
  );
}

function isCsrfRejection(err: unknown): boolean {
  if (!(err instanceof HttpErrorResponse) || err.status !== 403) return false;
  const body = ApiError.safeParse(err.error);
  return body.success && body.data.error.code === 'csrf';
}
