import { ACTORS, EMAIL, SIGNED_IN, type MatrixFeature } from './matrix-types';

// Demo layout (analytics-api/src/demo/load-demo.ts): rabbitry r1 "Fenwick Hollow" has owner,
// partner and mentor; r2 "Castellan Meadow" is owned by the officer. Club c1 has the officer,
// the owner and the member; c2 belongs to other-club alone.
export const foundation: MatrixFeature = { rows: {
  'get /health': { allowed: ACTORS, path: () => '/api/health' },
  'get /csrf': { allowed: ACTORS, path: () => '/api/csrf' },
  // Signing in is allowed to whoever holds the account's password; without it, 401.
  'post /session': {
    allowed: SIGNED_IN, path: () => '/api/session', mutates: true,
    body: (_i, actor) => (actor === 'anonymous' ? { email: 'owner@example.test', password: 'not-the-password' } : { email: EMAIL[actor], password: 'keeperline-demo' }),
  },
  'get /session': { allowed: SIGNED_IN, path: () => '/api/session' },
  'delete /session': { allowed: SIGNED_IN, path: () => '/api/session', mutates: true },
  'patch /me/preferences': { allowed: SIGNED_IN, path: () => '/api/me/preferences', body: () => ({ weightUnit: 'kg' }), mutates: true },
  'get /rabbitries': { allowed: SIGNED_IN, path: () => '/api/rabbitries' },
  'post /rabbitries': { allowed: SIGNED_IN, path: () => '/api/rabbitries', body: () => ({ name: 'Matrix Test Herd' }), mutates: true },
  'get /rabbitries/:rabbitryId': { allowed: ['admin', 'owner', 'partner', 'mentor'], path: (i) => `/api/rabbitries/${i.r1}` },
  'patch /rabbitries/:rabbitryId': { allowed: ['admin', 'owner', 'partner'], path: (i) => `/api/rabbitries/${i.r1}`, body: () => ({ location: 'Elsewhere' }), mutates: true },
  'delete /rabbitries/:rabbitryId': { allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}`, mutates: true },
  'get /rabbitries/:rabbitryId/members': { allowed: ['admin', 'owner', 'partner', 'mentor'], path: (i) => `/api/rabbitries/${i.r1}/members` },
  'post /rabbitries/:rabbitryId/members': {
    allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}/members`,
    body: () => ({ email: 'member@example.test', role: 'mentor' }), mutates: true,
  },
  'delete /rabbitries/:rabbitryId/members/:userId': {
    allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}/members/${i.user('mentor@example.test')}`, mutates: true,
  },
  'get /clubs': { allowed: SIGNED_IN, path: () => '/api/clubs' },
  'get /clubs/:clubId': { allowed: ['admin', 'officer', 'owner', 'member'], path: (i) => `/api/clubs/${i.c1}` },
  'get /clubs/:clubId/members': { allowed: ['admin', 'officer', 'owner', 'member'], path: (i) => `/api/clubs/${i.c1}/members` },
  'post /clubs/:clubId/members': {
    allowed: ['admin', 'officer'], path: (i) => `/api/clubs/${i.c1}/members`,
    body: () => ({ email: 'partner@example.test', role: 'member' }), mutates: true,
  },
  'delete /clubs/:clubId/members/:userId': {
    allowed: ['admin', 'officer'], path: (i) => `/api/clubs/${i.c1}/members/${i.user('member@example.test')}`, mutates: true,
  },
} };
