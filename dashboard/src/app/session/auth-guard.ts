import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import { safeReturnUrl } from './return-url';
import { Session } from './session';

/** Lets signed-in users through; sends everyone else to sign in and back here afterwards. */
export const authGuard: CanActivateFn = async (_route, state) => {
  const session = inject(Session);
  const router = inject(Router);
  try {
    const user = await session.restore();
    return user ? true : router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
  } catch {
    // The API could not be asked (offline, server error): say so instead of pretending "signed out".
    return router.createUrlTree(['/error'], { queryParams: { returnUrl: state.url } });
  }
};

/** The sign-in screen is for signed-out visitors; a signed-in user goes where they were headed. */
export const signedOutGuard: CanActivateFn = async (route) => {
  const session = inject(Session);
  const router = inject(Router);
  try {
    const user = await session.restore();
    return user ? router.parseUrl(safeReturnUrl(route.queryParamMap.get('returnUrl'))) : true;
  } catch {
    return true; // sign-in itself reports the API being unreachable
  }
};
