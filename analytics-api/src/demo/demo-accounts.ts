/**
 * Demo accounts, one per role, for local use only (listed in README). Every name is invented.
 */
export const DEMO_PASSWORD = 'keeperline-demo';

export const DEMO_ACCOUNTS = [
  { email: 'admin@example.test', displayName: 'Avery Lindqvist', isAdmin: true, role: 'admin' },
  { email: 'owner@example.test', displayName: 'Marla Fenwick', isAdmin: false, role: 'owner' },
  { email: 'partner@example.test', displayName: 'Dorian Fenwick', isAdmin: false, role: 'partner' },
  { email: 'mentor@example.test', displayName: 'Hollis Trevane', isAdmin: false, role: 'mentor' },
  { email: 'officer@example.test', displayName: 'Priya Castellan', isAdmin: false, role: 'officer' },
  { email: 'member@example.test', displayName: 'Jonah Whitlow', isAdmin: false, role: 'member' },
  { email: 'other-club@example.test', displayName: 'Sunniva Ortolan', isAdmin: false, role: 'member of another club' },
] as const;
