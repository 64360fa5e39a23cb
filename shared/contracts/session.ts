import * as z from 'zod';
import { CLUB_ROLES, RABBITRY_ROLES } from './roles';

export const SignInRequest = z.object({
  email: z.string().trim().toLowerCase().email('Enter the e-mail address of your account'),
  password: z.string().min(1, 'Enter your password'),
});
export type SignInRequest = z.infer<typeof SignInRequest>;

export const WeightUnit = z.enum(['lb-oz', 'kg']);
export const DateOrder = z.enum(['iso', 'mdy']);

export const RabbitryAccess = z.object({
  id: z.number().int(),
  name: z.string(),
  slug: z.string(),
  role: z.enum(RABBITRY_ROLES),
});
export type RabbitryAccess = z.infer<typeof RabbitryAccess>;

export const ClubAccess = z.object({
  id: z.number().int(),
  name: z.string(),
  role: z.enum(CLUB_ROLES),
});
export type ClubAccess = z.infer<typeof ClubAccess>;

/** The signed-in user with every membership: the dashboard builds its navigation from this. */
export const CurrentUser = z.object({
  id: z.number().int(),
  email: z.string(),
  displayName: z.string(),
  isAdmin: z.boolean(),
  weightUnit: WeightUnit,
  dateOrder: DateOrder,
  rabbitries: z.array(RabbitryAccess),
  clubs: z.array(ClubAccess),
});
export type CurrentUser = z.infer<typeof CurrentUser>;

export const MeResponse = z.object({ user: CurrentUser, csrfToken: z.string() });
export type MeResponse = z.infer<typeof MeResponse>;

export const UpdatePreferencesRequest = z.object({
  weightUnit: WeightUnit.optional(),
  dateOrder: DateOrder.optional(),
  displayName: z.string().trim().min(1).max(120).optional(),
});
