import type { Request } from 'express';
import { PedigreePdfQuery, PedigreeQuery } from '@shared/contracts/animals';
import { ANY_RABBITRY_ROLE } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { PedigreeService } from './pedigree.service';

const base = '/rabbitries/:rabbitryId/animals/:animalId';
const animalId = (req: Request) => idParam(req.params.animalId, 'Animal');

export function registerPedigreeRoutes(r: RouteRegistrar, service: PedigreeService): void {
  r.add('get', `${base}/pedigree`, ANY_RABBITRY_ROLE, async (req, res) => {
    const { generations } = validate(PedigreeQuery, req.query);
    res.json({ generations, tree: await service.tree(res.locals.access.rabbitryId!, animalId(req), generations) });
  });
  r.add('get', `${base}/pedigree.pdf`, ANY_RABBITRY_ROLE, async (req, res) => {
    const { paper } = validate(PedigreePdfQuery, req.query);
    const { fileName, pdf } = await service.certificate(res.locals.access.rabbitryId!, animalId(req), paper, req.user!.weightUnit);
    res.type('application/pdf').set('Content-Disposition', `inline; filename="${fileName}"`).set('Cache-Control', 'private, no-store').send(pdf);
  });
}
