import type { EntityManager } from '@mikro-orm/postgresql';
import { createSpeciesRequestSchema, updateSpeciesRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { Species } from './species.entity';
import { createSpecies, deleteSpecies, updateSpecies } from './save-species';
import { BUILTIN_SPECIES_VIEWS, toSpeciesView } from './to-species-view';

/**
 * The species catalogue: `GET /api/species/builtin` (any signed-in user),
 * `GET/POST /api/teams/:teamId/species` (viewer / editor+),
 * `GET/PATCH/DELETE /api/species/:id` (viewer / editor+ / editor+).
 */
export function speciesRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const kind = RECORD_KINDS.species;

  router.get('/species/builtin', requireUser, (_req, res) => {
    res.json(BUILTIN_SPECIES_VIEWS);
  });

  router.get('/teams/:teamId/species', requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const species = await em.find(Species, { team: currentMembership(res).team.id }, { orderBy: { name: 'asc' } });
    res.json(species.map(toSpeciesView));
  });

  router.post('/teams/:teamId/species', requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(createSpeciesRequestSchema, req.body);
    res.status(201).json(await createSpecies(em, { teamId: currentMembership(res).team.id, actorId: currentUserId(res), request }));
  });

  router.get('/species/:id', requireUser, requireRecordRole(em, kind, 'viewer'), async (_req, res) => {
    res.json(toSpeciesView(await em.findOneOrFail(Species, currentRecordId(res))));
  });

  router.patch('/species/:id', requireUser, requireRecordRole(em, kind, 'editor'), async (req, res) => {
    const request = parseBody(updateSpeciesRequestSchema, req.body);
    res.json(await updateSpecies(em, { speciesId: currentRecordId(res), actorId: currentUserId(res), request }));
  });

  router.delete('/species/:id', requireUser, requireRecordRole(em, kind, 'editor'), async (_req, res) => {
    await deleteSpecies(em, currentRecordId(res), currentUserId(res));
    res.status(204).end();
  });

  return router;
}
