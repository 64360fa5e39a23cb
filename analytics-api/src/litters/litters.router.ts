import type { Request } from 'express';
import { AddKitsRequest, CreateLitterRequest, KINDLING_CAUTION, LitterQuery, UpdateLitterRequest } from '@shared/contracts/litters';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { LittersService } from './litters.service';

const base = '/rabbitries/:rabbitryId/litters';
const litterId = (req: Request) => idParam(req.params.litterId, 'Litter');

export function registerLitterRoutes(r: RouteRegistrar, service: LittersService): void {
  r.add('get', base, ANY_RABBITRY_ROLE, async (req, res) => {
    const { format } = validate(LitterQuery, req.query);
    const rabbitryId = res.locals.access.rabbitryId!;
    if (format === 'csv') {
      res.attachment('litters.csv').type('text/csv').send(await service.csv(rabbitryId, req.user!.weightUnit));
      return;
    }
    res.json({ litters: await service.list(rabbitryId), caution: KINDLING_CAUTION });
  });
  r.add('post', base, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(CreateLitterRequest, req.body);
    res.status(201).json(await service.create(res.locals.access.rabbitryId!, req.user!.weightUnit, input));
  });
  r.add('patch', `${base}/:litterId`, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(UpdateLitterRequest, req.body);
    res.json(await service.update(res.locals.access.rabbitryId!, litterId(req), req.user!.weightUnit, input));
  });
  r.add('post', `${base}/:litterId/kits`, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(AddKitsRequest, req.body);
    res.status(201).json({ kits: await service.addKits(res.locals.access.rabbitryId!, litterId(req), input) });
  });
}
