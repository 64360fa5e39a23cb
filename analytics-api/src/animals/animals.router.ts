import type { Request } from 'express';
import { ChangeStatusRequest, CreateAnimalRequest, HerdQuery, KeeperDecisionRequest, UpdateAnimalRequest } from '@shared/contracts/animals';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS, rabbitry } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { AnimalsService } from './animals.service';

const base = '/rabbitries/:rabbitryId/animals';
const animalId = (req: Request) => idParam(req.params.animalId, 'Animal');

export function registerAnimalRoutes(r: RouteRegistrar, service: AnimalsService): void {
  r.add('get', base, ANY_RABBITRY_ROLE, async (req, res) => {
    const q = validate(HerdQuery, req.query);
    const rabbitryId = res.locals.access.rabbitryId!;
    if (q.format === 'csv') {
      res.attachment('herd.csv').type('text/csv').send(await service.csv(rabbitryId, q, req.user!.weightUnit));
      return;
    }
    res.json(await service.list(rabbitryId, q));
  });
  r.add('get', '/rabbitries/:rabbitryId/lines', ANY_RABBITRY_ROLE, async (_req, res) => {
    res.json({ lines: await service.lines(res.locals.access.rabbitryId!) });
  });
  r.add('post', base, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(CreateAnimalRequest, req.body);
    res.status(201).json(await service.create(res.locals.access.rabbitryId!, req.user!.weightUnit, input));
  });
  r.add('get', `${base}/:animalId`, ANY_RABBITRY_ROLE, async (req, res) => {
    res.json(await service.profile(res.locals.access.rabbitryId!, animalId(req), req.user!.weightUnit));
  });
  r.add('patch', `${base}/:animalId`, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(UpdateAnimalRequest, req.body);
    res.json(await service.update(res.locals.access.rabbitryId!, animalId(req), req.user!.weightUnit, input));
  });
  r.add('post', `${base}/:animalId/status`, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(ChangeStatusRequest, req.body);
    res.status(201).json({ statusHistory: await service.changeStatus(res.locals.access.rabbitryId!, animalId(req), req.user!.id, input) });
  });
  r.add('patch', `${base}/:animalId/keeper-decision`, RABBITRY_EDITORS, async (req, res) => {
    const { decision } = validate(KeeperDecisionRequest, req.body);
    res.json(await service.setKeeperDecision(res.locals.access.rabbitryId!, animalId(req), decision));
  });
  r.add('delete', `${base}/:animalId`, rabbitry('owner'), async (req, res) => {
    await service.remove(res.locals.access.rabbitryId!, animalId(req));
    res.status(204).end();
  });
}
