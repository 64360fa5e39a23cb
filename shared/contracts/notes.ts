import * as z from 'zod';

export const CreateNoteRequest = z.object({
  body: z.string().trim().min(1, 'Write the note').max(5000, 'A note has at most 5000 characters'),
  /** The animal the note is about, if any (an animal of the same rabbitry). */
  animalId: z.number().int().positive().nullish(),
});

export const NotesQuery = z.object({ animalId: z.coerce.number().int().positive().optional() });

export const Note = z.object({
  id: z.number().int(),
  animalId: z.number().int().nullable(),
  animalEarId: z.string().nullable(),
  authorId: z.number().int(),
  authorName: z.string(),
  body: z.string(),
  createdAt: z.string(),
  /** The reader may delete it (its author, the owner, or an administrator). */
  canDelete: z.boolean(),
});
export type Note = z.infer<typeof Note>;
