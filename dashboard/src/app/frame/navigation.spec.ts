import { RABBITRY_ROLES, CLUB_ROLES } from '@shared/contracts/roles';
import { userWith } from '../session/test-users';
import { NAVIGATION, NavEntry, navigationFor } from './navigation';
import { WorkingContext } from './working-context';

const inRabbitry = (role: 'owner' | 'partner' | 'mentor'): WorkingContext => ({ kind: 'rabbitry', id: 7, name: 'Brackenrow', role });
const inClub = (role: 'officer' | 'member'): WorkingContext => ({ kind: 'club', id: 3, name: 'Saltmeadow Fanciers', role });
const links = (sections: ReturnType<typeof navigationFor>) => sections.flatMap((s) => s.items.map((i) => `${i.label} ${i.link}`));

describe('navigationFor with the real table', () => {
  const user = userWith();

  it('shows only the site entries when working across everything', () => {
    expect(navigationFor(user, { kind: 'everything' })).toEqual([
      { title: null, role: null, items: [{ label: 'Home', link: '/', exact: true }] },
    ]);
  });

  it.each(['owner', 'partner', 'mentor'] as const)('gives a rabbitry %s its overview and the access list', (role) => {
    const sections = navigationFor(user, inRabbitry(role));
    expect(sections[1]).toMatchObject({ title: 'Brackenrow', role });
    expect(links(sections)).toEqual(['Home /', 'Overview /r/7', 'Access /r/7/access']);
  });

  it.each(['officer', 'member'] as const)('gives a club %s its overview and members', (role) => {
    expect(links(navigationFor(user, inClub(role)))).toEqual(['Home /', 'Overview /c/3', 'Members /c/3/members']);
  });

  it('marks overviews as exact so they do not light up on their sub-pages', () => {
    const [, rabbitry] = navigationFor(user, inRabbitry('owner'));
    expect(rabbitry.items.map((i) => i.exact)).toEqual([true, false]);
  });

  it('gives an admin no screens that do not exist yet', () => {
    expect(links(navigationFor(userWith({ isAdmin: true }), { kind: 'everything' }))).toEqual(['Home /']);
  });

  it('declares, for every entry, only roles that belong to its scope', () => {
    const allowed: Record<NavEntry['scope'], readonly string[]> = {
      site: ['signed-in', 'admin'],
      rabbitry: RABBITRY_ROLES,
      club: CLUB_ROLES,
    };
    for (const entry of NAVIGATION) {
      expect(entry.roles.length, entry.label).toBeGreaterThan(0);
      expect(entry.roles.every((role) => allowed[entry.scope].includes(role)), entry.label).toBe(true);
    }
  });
});

describe('navigationFor filters by role', () => {
  // A table of the shape later features will add, to check the filtering itself.
  const table: NavEntry[] = [
    { scope: 'site', label: 'Home', path: '', roles: ['signed-in'] },
    { scope: 'site', label: 'Accounts', path: 'accounts', roles: ['admin'] },
    { scope: 'rabbitry', label: 'Herd', path: 'herd', roles: ['owner', 'partner', 'mentor'] },
    { scope: 'rabbitry', label: 'Imports', path: 'imports', roles: ['owner', 'partner'] },
    { scope: 'rabbitry', label: 'Settings', path: 'settings', roles: ['owner'] },
    { scope: 'club', label: 'Season', path: 'season', roles: ['officer', 'member'] },
    { scope: 'club', label: 'Shows', path: 'shows', roles: ['officer'] },
  ];

  it('shows admin-only site entries to admins alone', () => {
    expect(links(navigationFor(userWith({ isAdmin: true }), { kind: 'everything' }, table))).toEqual([
      'Home /',
      'Accounts /accounts',
    ]);
    expect(links(navigationFor(userWith(), { kind: 'everything' }, table))).toEqual(['Home /']);
  });

  it('narrows the rabbitry entries from owner to partner to mentor', () => {
    const labels = (role: 'owner' | 'partner' | 'mentor') => navigationFor(userWith(), inRabbitry(role), table)[1].items.map((i) => i.label);
    expect(labels('owner')).toEqual(['Herd', 'Imports', 'Settings']);
    expect(labels('partner')).toEqual(['Herd', 'Imports']);
    expect(labels('mentor')).toEqual(['Herd']);
  });

  it('keeps club entries out of a rabbitry and officer entries from members', () => {
    expect(links(navigationFor(userWith(), inRabbitry('owner'), table))).not.toContain('Season /r/7/season');
    expect(links(navigationFor(userWith(), inClub('member'), table))).toEqual(['Home /', 'Season /c/3/season']);
  });

  it('drops a context section in which the role sees nothing', () => {
    const ownerOnly: NavEntry[] = [{ scope: 'rabbitry', label: 'Settings', path: 'settings', roles: ['owner'] }];
    expect(navigationFor(userWith(), inRabbitry('mentor'), ownerOnly)).toEqual([]);
  });
});
