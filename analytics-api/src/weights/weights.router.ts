import { AddWeightRequest } from '@shared/contracts/animals';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { WeightsService } from './weights.service';

export function registerWeightRoutes(r: RouteRegistrar, service: WeightsService): void {
  const path = '/rabbitries/:rabbitryId/animals/:animalId/weights';
  r.add('get', path, ANY_RABBITRY_ROLE, async (req, res) => {
    res.json({ weights: await service.list(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal'), req.user!.weightUnit) });
  });
  r.add('post', path, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(AddWeightRequest, req.body);
    res.status(201).json(await service.add(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal'), req.user!.weightUnit, input));
  });
  r.add('delete', '/rabbitries/:rabbitryId/weights/:weightId', RABBITRY_EDITORS, async (req, res) => {
    await service.remove(res.locals.access.rabbitryId!, idParam(req.params.weightId, 'Weighing'));
    res.status(204).end();
  });
}
