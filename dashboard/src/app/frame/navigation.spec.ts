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

  it.each(['owner', 'partner', 'mentor'] as const)('gives a rabbitry %s its overview, records and the access list', (role) => {
    const sections = navigationFor(user, inRabbitry(role));
    expect(sections[1]).toMatchObject({ title: 'Brackenrow', role });
    const all = links(sections);
    // Other screens sit between these; the overview comes first and the access list last.
    expect(all.slice(0, 2)).toEqual(['Home /', 'Overview /r/7']);
    expect(all.at(-1)).toBe('Access /r/7/access');
    expect(all).toEqual(expect.arrayContaining(['Herd /r/7/herd', 'Litters /r/7/litters', 'Imports /r/7/imports']));
  });

  it('gives a club officer its overview, members, shows and imports', () => {
    const all = links(navigationFor(user, inClub('officer')));
    expect(all.slice(0, 3)).toEqual(['Home /', 'Overview /c/3', 'Members /c/3/members']);
    expect(all).toEqual(expect.arrayContaining(['Shows & results /c/3/shows', 'Imports /c/3/imports']));
  });

  it('gives a club member the shows but not the imports, which only officers make', () => {
    const all = links(navigationFor(user, inClub('member')));
    expect(all.slice(0, 3)).toEqual(['Home /', 'Overview /c/3', 'Members /c/3/members']);
    expect(all).toContain('Shows & results /c/3/shows');
    expect(all).not.toContain('Imports /c/3/imports');
  });

  it.each(['owner', 'partner', 'mentor'] as const)('gives a rabbitry %s the pairing planner and the line comparison', (role) => {
    expect(links(navigationFor(user, inRabbitry(role)))).toEqual(expect.arrayContaining(['Pairing planner /r/7/pairing', 'Line comparison /r/7/lines']));
  });

  it.each(['owner', 'partner', 'mentor'] as const)('gives a rabbitry %s the four breeder panels', (role) => {
    expect(links(navigationFor(user, inRabbitry(role)))).toEqual(expect.arrayContaining([
      'Keeper board /r/7/keepers', 'Sires & dams /r/7/sires-dams', 'Trait inheritance /r/7/traits', 'Growth curves /r/7/growth',
    ]));
  });

  it.each(['officer', 'member'] as const)('gives a club %s the season', (role) => {
    expect(links(navigationFor(user, inClub(role)))).toContain('Season /c/3/season');
  });

  it('marks overviews as exact so they do not light up on their sub-pages', () => {
    const [, rabbitry] = navigationFor(user, inRabbitry('owner'));
    expect(rabbitry.items.map((i) => i.exact)).toEqual(rabbitry.items.map((_, i) => i === 0));
  });

  it('gives an admin the breed catalogue and no one else', () => {
    expect(links(navigationFor(userWith({ isAdmin: true }), { kind: 'everything' }))).toEqual(expect.arrayContaining(['Home /', 'Breed catalogue /admin/breeds']));
    expect(links(navigationFor(userWith(), { kind: 'everything' }))).toEqual(['Home /']);
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
