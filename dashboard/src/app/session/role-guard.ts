import { inject } from '@angular/core';
import { CanActivateFn, RedirectCommand, Router } from '@angular/router';
import { CurrentUser } from '@shared/contracts/session';
import { Session } from './session';

type Membership = (user: CurrentUser, id: string) => boolean;

/**
 * A rabbitry or club the user holds no role in shows the not-found screen at the same address:
 * the dashboard does not reveal whether it exists. The API checks every call again.
 */
function membershipGuard(param: string, isMember: Membership): CanActivateFn {
  return async (route, state) => {
    const session = inject(Session);
    const router = inject(Router);
    const id = route.paramMap.get(param) ?? '';
    const user = await session.restore().catch(() => null);
    if (user && isMember(user, id)) return true;
    // Access may have been granted since the page loaded: ask once more before saying no.
    const fresh = user ? await session.refresh().catch(() => user) : null;
    if (fresh && isMember(fresh, id)) return true;
    if (!fresh) return router.createUrlTree(['/sign-in'], { queryParams: { returnUrl: state.url } });
    return new RedirectCommand(router.parseUrl('/not-found'), { skipLocationChange: true });
  };
}

export const rabbitryMemberGuard = membershipGuard('rabbitryId', (user, id) =>
  user.rabbitries.some((rabbitry) => String(rabbitry.id) === id),
);

export const clubMemberGuard = membershipGuard('clubId', (user, id) =>
  user.clubs.some((club) => String(club.id) === id),
);
