/** Shared vocabulary of the access matrix (test/api/access-matrix.spec.ts). */
export type Actor = 'anonymous' | 'admin' | 'owner' | 'partner' | 'mentor' | 'officer' | 'member' | 'other-club';
export const ACTORS: Actor[] = ['anonymous', 'admin', 'owner', 'partner', 'mentor', 'officer', 'member', 'other-club'];
export const SIGNED_IN: Actor[] = ACTORS.filter((a) => a !== 'anonymous');

export interface Ids { r1: number; r2: number; c1: number; c2: number; user: (email: string) => number }
export interface Row {
  allowed: Actor[];
  path: (ids: Ids) => string;
  body?: (ids: Ids, actor: Actor) => object;
  /** Changes state: each allowed actor gets a freshly loaded demo. */
  mutates?: boolean;
}

// What each actor may see; every other rabbitry or club name must be absent from its answers.
export const VISIBLE: Record<Actor, string[]> = {
  anonymous: [],
  admin: ['Fenwick Hollow', 'Castellan Meadow', 'Brackenford Valley Rabbit Club', 'Lowmere Coast Fanciers'],
  owner: ['Fenwick Hollow', 'Brackenford Valley Rabbit Club'],
  partner: ['Fenwick Hollow'],
  mentor: ['Fenwick Hollow'],
  officer: ['Castellan Meadow', 'Brackenford Valley Rabbit Club'],
  member: ['Brackenford Valley Rabbit Club'],
  'other-club': ['Lowmere Coast Fanciers'],
};
export const ALL_NAMES = VISIBLE.admin;
export const EMAIL: Record<Exclude<Actor, 'anonymous'>, string> = {
  admin: 'admin@example.test', owner: 'owner@example.test', partner: 'partner@example.test', mentor: 'mentor@example.test',
  officer: 'officer@example.test', member: 'member@example.test', 'other-club': 'other-club@example.test',
};

