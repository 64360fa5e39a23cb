import { ClubRole, RabbitryRole } from '@shared/contracts/roles';
import { CurrentUser } from '@shared/contracts/session';

/** Where the breeder is working: everything they belong to, one rabbitry, or one club. */
export type WorkingContext =
  | { kind: 'everything' }
  | { kind: 'rabbitry'; id: number; name: string; role: RabbitryRole }
  | { kind: 'club'; id: number; name: string; role: ClubRole };

export interface ContextParams {
  rabbitryId?: string;
  clubId?: string;
}

/**
 * Reads the context from the route's parameters and the user's memberships. An id the user
 * holds no role in gives "everything" (the role guards show not-found for it). Cost O(r + c)
 * for r rabbitries and c clubs.
 */
export function workingContextFor(user: CurrentUser, params: ContextParams): WorkingContext {
  const rabbitry = params.rabbitryId && user.rabbitries.find((r) => String(r.id) === params.rabbitryId);
  if (rabbitry) return { kind: 'rabbitry', id: rabbitry.id, name: rabbitry.name, role: rabbitry.role };
  const club = params.clubId && user.clubs.find((c) => String(c.id) === params.clubId);
  if (club) return { kind: 'club', id: club.id, name: club.name, role: club.role };
  return { kind: 'everything' };
}
