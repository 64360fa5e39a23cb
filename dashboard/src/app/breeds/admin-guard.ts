import { inject } from '@angular/core';
import { CanActivateFn, RedirectCommand, Router } from '@angular/router';
import { Session } from '../session/session';

/**
 * Site administrators only. Anyone else sees the not-found screen at the same address, as for a
 * rabbitry they hold no role in; the API refuses their edits as well.
 */
export const adminGuard: CanActivateFn = async () => {
  const router = inject(Router);
  const user = await inject(Session).restore().catch(() => null);
  if (user?.isAdmin) return true;
  return new RedirectCommand(router.parseUrl('/not-found'), { skipLocationChange: true });
};
