/** Roles exactly as the product design defines them. */
export const RABBITRY_ROLES = ['owner', 'partner', 'mentor'] as const;
export type RabbitryRole = (typeof RABBITRY_ROLES)[number];
export const CLUB_ROLES = ['officer', 'member'] as const;
export type ClubRole = (typeof CLUB_ROLES)[number];

/** What each role may do, in words for the README and the access settings screen. */
export const ROLE_DESCRIPTIONS: Record<RabbitryRole | ClubRole | 'admin', string> = {
  admin: 'Everything on the site; manages accounts and the breed catalogue.',
  owner: 'Edits the rabbitry’s animals, litters, weights and evaluations; grants and revokes access; may delete the rabbitry.',
  partner: 'Edits the rabbitry’s records; cannot grant access or delete the rabbitry.',
  mentor: 'Reads everything in the rabbitry and leaves notes; makes no edits.',
  officer: 'Manages the club’s shows and season, imports show results, adds members.',
  member: 'Reads the club’s season results and analytics; sees own placements.',
};
