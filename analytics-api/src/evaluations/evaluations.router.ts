import { AddEvaluationRequest } from '@shared/contracts/animals';
import { ANY_RABBITRY_ROLE, RABBITRY_EDITORS } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { EvaluationsService } from './evaluations.service';

export function registerEvaluationRoutes(r: RouteRegistrar, service: EvaluationsService): void {
  const path = '/rabbitries/:rabbitryId/animals/:animalId/evaluations';
  r.add('get', path, ANY_RABBITRY_ROLE, async (req, res) => {
    res.json(await service.list(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal')));
  });
  r.add('post', path, RABBITRY_EDITORS, async (req, res) => {
    const input = validate(AddEvaluationRequest, req.body);
    res.status(201).json(await service.add(res.locals.access.rabbitryId!, idParam(req.params.animalId, 'Animal'), input));
  });
  r.add('delete', '/rabbitries/:rabbitryId/evaluations/:evaluationId', RABBITRY_EDITORS, async (req, res) => {
    await service.remove(res.locals.access.rabbitryId!, idParam(req.params.evaluationId, 'Evaluation'));
    res.status(204).end();
  });
}
