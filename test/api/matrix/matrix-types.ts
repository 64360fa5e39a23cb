import type { DataSource } from 'typeorm';
/** Shared vocabulary of the access matrix (test/api/access-matrix.spec.ts). */
export type Actor = 'anonymous' | 'admin' | 'owner' | 'partner' | 'mentor' | 'officer' | 'member' | 'other-club';
export const ACTORS: Actor[] = ['anonymous', 'admin', 'owner', 'partner', 'mentor', 'officer', 'member', 'other-club'];
export const SIGNED_IN: Actor[] = ACTORS.filter((a) => a !== 'anonymous');

export interface Ids {
  r1: number; r2: number; c1: number; c2: number;
  user: (email: string) => number;
  /** Ids of the records that features' fixtures created (animalId, jobId, …). */
  fixture: Record<string, number>;
}

/** A feature's part of the matrix: its rows, and the records they need on top of the demo. */
export interface MatrixFeature {
  rows: Record<string, Row>;
  fixture?: (db: DataSource, ids: Ids) => Promise<Record<string, number>>;
}
export interface Row {
  allowed: Actor[];
  path: (ids: Ids) => string;
  body?: (ids: Ids, actor: Actor) => object;
  /** Statuses an allowed caller may get besides 2xx (the route's own answer past the access check). */
  expect?: number[];
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

