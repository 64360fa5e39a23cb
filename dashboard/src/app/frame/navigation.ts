import { ClubRole, RabbitryRole } from '@shared/contracts/roles';
import { CurrentUser } from '@shared/contracts/session';
import { WorkingContext } from './working-context';

/** "signed-in" is anyone with an account; "admin" is the site role. */
export type NavRole = RabbitryRole | ClubRole | 'admin' | 'signed-in';

/**
 * One row of the navigation table. `path` is relative to the scope's own address
 * (`/`, `/r/:rabbitryId`, `/c/:clubId`); `roles` lists every role that sees the entry.
 */
export interface NavEntry {
  scope: 'site' | 'rabbitry' | 'club';
  label: string;
  path: string;
  roles: readonly NavRole[];
}

export interface NavItem {
  label: string;
  link: string;
  /** Only the exact address counts as "here" (an overview must not light up on its sub-pages). */
  exact: boolean;
}

export interface NavSection {
  /** null for the site-wide section; the rabbitry's or club's name otherwise. */
  title: string | null;
  role: NavRole | null;
  items: NavItem[];
}

/** Later features add their screens here, with the roles that may open them. */
export const NAVIGATION: readonly NavEntry[] = [
  { scope: 'site', label: 'Home', path: '', roles: ['signed-in'] },
  { scope: 'site', label: 'Breed catalogue', path: 'admin/breeds', roles: ['admin'] },
  { scope: 'rabbitry', label: 'Overview', path: '', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Herd', path: 'herd', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Litters', path: 'litters', roles: ['owner', 'partner', 'mentor'] },
  // Mentors read the import history (the API allows it); the screen offers the wizard to editors only.
  { scope: 'rabbitry', label: 'Imports', path: 'imports', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Keeper board', path: 'keepers', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Sires & dams', path: 'sires-dams', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Trait inheritance', path: 'traits', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Growth curves', path: 'growth', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Pairing planner', path: 'pairing', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'rabbitry', label: 'Line comparison', path: 'lines', roles: ['owner', 'partner', 'mentor'] },
  // Everyone with a role sees who else has access; only the owner changes it (the screen and the API enforce that).
  { scope: 'rabbitry', label: 'Access', path: 'access', roles: ['owner', 'partner', 'mentor'] },
  { scope: 'club', label: 'Overview', path: '', roles: ['officer', 'member'] },
  { scope: 'club', label: 'Members', path: 'members', roles: ['officer', 'member'] },
  { scope: 'club', label: 'Shows & results', path: 'shows', roles: ['officer', 'member'] },
  // Members read the season; only officers see its points formula editor (the screen and the API enforce that).
  { scope: 'club', label: 'Season', path: 'season', roles: ['officer', 'member'] },
  { scope: 'club', label: 'Imports', path: 'imports', roles: ['officer'] },
];

/**
 * The navigation a user sees in a context: the site-wide entries their site roles allow, then
 * the entries of the current rabbitry or club that their role there allows.
 * Cost O(e) for e table entries.
 */
export function navigationFor(
  user: CurrentUser,
  context: WorkingContext,
  table: readonly NavEntry[] = NAVIGATION,
): NavSection[] {
  const siteRoles: NavRole[] = user.isAdmin ? ['signed-in', 'admin'] : ['signed-in'];
  const sections: NavSection[] = [
    { title: null, role: null, items: itemsFor(table, 'site', siteRoles, '') },
  ];
  if (context.kind !== 'everything') {
    const base = context.kind === 'rabbitry' ? `/r/${context.id}` : `/c/${context.id}`;
    sections.push({ title: context.name, role: context.role, items: itemsFor(table, context.kind, [context.role], base) });
  }
  return sections.filter((section) => section.items.length > 0);
}

function itemsFor(table: readonly NavEntry[], scope: NavEntry['scope'], roles: readonly NavRole[], base: string): NavItem[] {
  return table
    .filter((entry) => entry.scope === scope && entry.roles.some((role) => roles.includes(role)))
    .map((entry) => ({
      label: entry.label,
      link: entry.path ? `${base}/${entry.path}` : base || '/',
      exact: entry.path === '',
    }));
}
