import * as z from 'zod';
import { RABBITRY_ROLES } from './roles';

export const Rabbitry = z.object({
  id: z.number().int(),
  name: z.string(),
  slug: z.string(),
  location: z.string().nullable(),
  role: z.enum(RABBITRY_ROLES).nullable(),
  counts: z.object({ animals: z.number().int(), litters: z.number().int() }),
});
export type Rabbitry = z.infer<typeof Rabbitry>;

export const CreateRabbitryRequest = z.object({
  name: z.string().trim().min(2, 'Give the rabbitry a name of at least 2 characters').max(120),
  location: z.string().trim().max(120).nullish(),
});
export const UpdateRabbitryRequest = CreateRabbitryRequest.partial();

export const RabbitryMember = z.object({
  userId: z.number().int(),
  displayName: z.string(),
  email: z.string(),
  role: z.enum(RABBITRY_ROLES),
});
export type RabbitryMember = z.infer<typeof RabbitryMember>;

/** Owners grant partner or mentor access; ownership itself is not granted this way. */
export const GrantRabbitryAccessRequest = z.object({
  email: z.string().trim().toLowerCase().email('Enter an e-mail address'),
  role: z.enum(['partner', 'mentor']),
});
