import { CreateBreedRequest, UpdateBreedRequest } from '@shared/contracts/breeds';
import { ADMIN, SIGNED_IN } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';
import { idParam, validate } from '../http/validate';
import type { BreedsService } from './breeds.service';

/** The breed catalogue: everyone signed in reads it, administrators edit it. */
export function registerBreedRoutes(r: RouteRegistrar, service: BreedsService): void {
  r.add('get', '/breeds', SIGNED_IN, async (_req, res) => {
    res.json({ breeds: await service.list() });
  });
  r.add('post', '/breeds', ADMIN, async (req, res) => {
    res.status(201).json(await service.create(validate(CreateBreedRequest, req.body)));
  });
  r.add('patch', '/breeds/:breedId', ADMIN, async (req, res) => {
    const id = idParam(req.params.breedId, 'Breed');
    const patch = validate(UpdateBreedRequest, req.body);
    const merged = validate(CreateBreedRequest, await service.merged(id, patch));
    res.json(await service.update(id, merged));
  });
  r.add('delete', '/breeds/:breedId', ADMIN, async (req, res) => {
    await service.remove(idParam(req.params.breedId, 'Breed'));
    res.status(204).end();
  });
}
