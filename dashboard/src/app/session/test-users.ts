import { HttpTestingController } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { CurrentUser } from '@shared/contracts/session';
import { Session } from './session';

/** Invented accounts for component and unit tests. */
export function userWith(overrides: Partial<CurrentUser> = {}): CurrentUser {
  return {
    id: 1,
    email: 'wren@example.test',
    displayName: 'Wren Tallow',
    isAdmin: false,
    weightUnit: 'lb-oz',
    dateOrder: 'iso',
    rabbitries: [],
    clubs: [],
    ...overrides,
  };
}

/** Signs the test's Session in the way the app does: by answering GET /api/session. */
export async function signInAs(user: CurrentUser, csrfToken = 'token-from-session'): Promise<Session> {
  const session = TestBed.inject(Session);
  const restored = session.restore();
  TestBed.inject(HttpTestingController).expectOne('/api/session').flush({ user, csrfToken });
  await restored;
  return session;
}
