import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import type { ClubRole, RabbitryRole } from '@shared/contracts/roles';
import { ClubMembership } from '../db/entities/club-membership.entity';
import { RabbitryMembership } from '../db/entities/rabbitry-membership.entity';
import { AppError, forbidden } from '../http/app-error';
import { idParam } from '../http/validate';

/** What a route needs from its caller. Every route declares one (see route-registrar.ts). */
export type AccessRule =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'admin' }
  | { kind: 'rabbitry'; roles: readonly RabbitryRole[] }
  | { kind: 'club'; roles: readonly ClubRole[] };

export const PUBLIC: AccessRule = { kind: 'public' };
export const SIGNED_IN: AccessRule = { kind: 'signed-in' };
export const ADMIN: AccessRule = { kind: 'admin' };
export const rabbitry = (...roles: RabbitryRole[]): AccessRule => ({ kind: 'rabbitry', roles });
export const club = (...roles: ClubRole[]): AccessRule => ({ kind: 'club', roles });
export const ANY_RABBITRY_ROLE = rabbitry('owner', 'partner', 'mentor');
export const RABBITRY_EDITORS = rabbitry('owner', 'partner');
export const ANY_CLUB_ROLE = club('officer', 'member');

/** The caller's resolved standing for the object the route names, set on `res.locals.access`. */
export interface ResolvedAccess {
  userId: number;
  isAdmin: boolean;
  rabbitryId?: number;
  rabbitryRole?: RabbitryRole | 'admin';
  clubId?: number;
  clubRole?: ClubRole | 'admin';
}

/**
 * One middleware resolves the caller's role for the rabbitry (`:rabbitryId`) or club (`:clubId`)
 * named in the route and checks it against the rule. Not belonging at all answers 404, so that
 * the existence of another breeder's herd is not revealed; belonging with too small a role, 403.
 */
export function enforce(rule: AccessRule, db: DataSource): RequestHandler {
  return async (req, res, next) => {
    if (rule.kind === 'public') return next();
    const user = req.user;
    if (!user) throw new AppError('unauthenticated', 'Sign in first', 401);
    const access: ResolvedAccess = { userId: user.id, isAdmin: user.isAdmin };
    res.locals.access = access;
    if (rule.kind === 'signed-in') return next();
    if (rule.kind === 'admin') {
      if (!user.isAdmin) throw forbidden('Only site administrators may do this');
      return next();
    }
    if (rule.kind === 'rabbitry') {
      const rabbitryId = idParam(req.params.rabbitryId, 'Rabbitry');
      const m = await db.getRepository(RabbitryMembership).findOneBy({ rabbitryId, userId: user.id });
      access.rabbitryId = rabbitryId;
      access.rabbitryRole = m?.role ?? (user.isAdmin ? 'admin' : undefined);
      if (!access.rabbitryRole) throw new AppError('not-found', 'Rabbitry was not found', 404);
      if (access.rabbitryRole !== 'admin' && !rule.roles.includes(access.rabbitryRole)) throw forbidden();
      return next();
    }
    const clubId = idParam(req.params.clubId, 'Club');
    const m = await db.getRepository(ClubMembership).findOneBy({ clubId, userId: user.id });
    access.clubId = clubId;
    access.clubRole = m?.role ?? (user.isAdmin ? 'admin' : undefined);
    if (!access.clubRole) throw new AppError('not-found', 'Club was not found', 404);
    if (access.clubRole !== 'admin' && !rule.roles.includes(access.clubRole)) throw forbidden();
    next();
  };
}
