import { CreateNoteRequest, NotesQuery } from '@shared/contracts/notes';
import { ANY_RABBITRY_ROLE } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { NotesService } from './notes.service';

/** Mentors have no edits, but notes are theirs to leave: every rabbitry role may write one. */
export function registerNoteRoutes(r: RouteRegistrar, service: NotesService): void {
  const base = '/rabbitries/:rabbitryId/notes';
  r.add('get', base, ANY_RABBITRY_ROLE, async (req, res) => {
    const { animalId } = validate(NotesQuery, req.query);
    res.json({ notes: await service.list(res.locals.access, animalId) });
  });
  r.add('post', base, ANY_RABBITRY_ROLE, async (req, res) => {
    res.status(201).json(await service.create(res.locals.access, validate(CreateNoteRequest, req.body)));
  });
  r.add('delete', `${base}/:noteId`, ANY_RABBITRY_ROLE, async (req, res) => {
    await service.remove(res.locals.access, idParam(req.params.noteId, 'Note'));
    res.status(204).end();
  });
}
