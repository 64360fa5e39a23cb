import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, GuardResult, MaybeAsync, Router, RouterStateSnapshot, UrlTree, convertToParamMap, provideRouter } from '@angular/router';
import { firstValueFrom, isObservable } from 'rxjs';
import { authGuard, signedOutGuard } from './auth-guard';
import { CsrfToken } from './csrf-token';
import { Session } from './session';
import { userWith } from './test-users';

function run(guard: typeof authGuard, url: string, query: Record<string, string> = {}): Promise<GuardResult> {
  const route = { queryParamMap: convertToParamMap(query) } as ActivatedRouteSnapshot;
  const result: MaybeAsync<GuardResult> = TestBed.runInInjectionContext(() => guard(route, { url } as RouterStateSnapshot));
  return isObservable(result) ? firstValueFrom(result) : Promise.resolve(result);
}

const serialized = (result: GuardResult) => (result instanceof UrlTree ? TestBed.inject(Router).serializeUrl(result) : result);

describe('authGuard', () => {
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => backend.verify());

  it('sends a visitor the API does not know to sign in, remembering where they were going', async () => {
    const result = run(authGuard, '/r/7/access');
    backend.expectOne('/api/session').flush({ error: { code: 'unauthenticated', message: 'Sign in first.' } }, { status: 401, statusText: 'Unauthorized' });
    expect(serialized(await result)).toBe('/sign-in?returnUrl=%2Fr%2F7%2Faccess');
  });

  it('lets a signed-in user through and holds the user and their token', async () => {
    const result = run(authGuard, '/');
    backend.expectOne('/api/session').flush({ user: userWith(), csrfToken: 'from-session' });
    expect(await result).toBe(true);
    expect(TestBed.inject(Session).user()?.displayName).toBe('Wren Tallow');
    expect(TestBed.inject(CsrfToken).value()).toBe('from-session');
  });

  it('asks the API only once per page load', async () => {
    const first = run(authGuard, '/');
    backend.expectOne('/api/session').flush({ user: userWith(), csrfToken: 't' });
    await first;
    expect(await run(authGuard, '/preferences')).toBe(true);
    backend.expectNone('/api/session');
  });

  it('shows the error screen, not sign-in, when the API cannot be asked', async () => {
    const result = run(authGuard, '/c/3');
    backend.expectOne('/api/session').flush('upstream down', { status: 502, statusText: 'Bad Gateway' });
    expect(serialized(await result)).toBe('/error?returnUrl=%2Fc%2F3');
  });
});

describe('signedOutGuard', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
  });

  it('shows sign-in to a visitor', async () => {
    const result = run(signedOutGuard, '/sign-in');
    TestBed.inject(HttpTestingController).expectOne('/api/session').flush(null, { status: 401, statusText: 'Unauthorized' });
    expect(await result).toBe(true);
  });

  it('sends a signed-in user on to a safe return address only', async () => {
    const first = run(signedOutGuard, '/sign-in', { returnUrl: '/c/3/members' });
    TestBed.inject(HttpTestingController).expectOne('/api/session').flush({ user: userWith(), csrfToken: 't' });
    expect(serialized(await first)).toBe('/c/3/members');
    expect(serialized(await run(signedOutGuard, '/sign-in', { returnUrl: '//elsewhere.example' }))).toBe('/');
  });
});
