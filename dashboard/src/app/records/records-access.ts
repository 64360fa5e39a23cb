import type { ClubRole, RabbitryRole } from '@shared/contracts/roles';
import type { CurrentUser } from '@shared/contracts/session';

/** The user's role in a rabbitry named by its route id, or null. O(r) for r rabbitries. */
export function rabbitryRoleOf(user: CurrentUser | null, rabbitryId: string): RabbitryRole | null {
  return user?.rabbitries.find((r) => String(r.id) === rabbitryId)?.role ?? null;
}

/** The user's role in a club named by its route id, or null. O(c) for c clubs. */
export function clubRoleOf(user: CurrentUser | null, clubId: string): ClubRole | null {
  return user?.clubs.find((c) => String(c.id) === clubId)?.role ?? null;
}

/**
 * Owners and partners edit a rabbitry's records; mentors read and leave notes. Screens use this
 * to offer only what the API will accept (the API checks every call again).
 */
export function editsRecords(role: RabbitryRole | null): boolean {
  return role === 'owner' || role === 'partner';
}
