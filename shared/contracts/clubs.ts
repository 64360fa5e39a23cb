import * as z from 'zod';
import { CLUB_ROLES } from './roles';

export const Club = z.object({
  id: z.number().int(),
  name: z.string(),
  region: z.string().nullable(),
  seasonStart: z.string().nullable(),
  seasonEnd: z.string().nullable(),
  role: z.enum(CLUB_ROLES).nullable(),
  counts: z.object({ members: z.number().int(), shows: z.number().int(), results: z.number().int() }),
});
export type Club = z.infer<typeof Club>;

export const ClubMember = z.object({
  userId: z.number().int(),
  displayName: z.string(),
  email: z.string(),
  role: z.enum(CLUB_ROLES),
  exhibitorName: z.string().nullable(),
});
export type ClubMember = z.infer<typeof ClubMember>;

export const AddClubMemberRequest = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  role: z.enum(CLUB_ROLES).default('member'),
  exhibitorName: z.string().trim().max(120).nullish(),
});
