import type { EntityManager } from '@mikro-orm/postgresql';
import { createMassBalanceModelRequestSchema, updateMassBalanceModelRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { SITE_RECORD_KINDS } from '../site-data/record-kinds';
import { downloadName } from '../site-data/upload';
import { requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { MassBalanceModel } from './mass-balance-model.entity';
import { modelListCsv, solutionsCsv } from './models-csv';
import { createMassBalanceModel, deleteMassBalanceModel, resolveMassBalanceModel, updateMassBalanceModel } from './save-mass-balance-model';
import { toModelView } from './to-model-view';

/**
 * Mass-balance models (viewers read, editors write): `GET/POST /api/teams/:teamId/mass-balance-models`,
 * `GET …/export.csv`, `GET/PATCH/DELETE /api/mass-balance-models/:id`, `POST …/:id/solve`, `GET …/:id/models.csv`.
 */
export function massBalanceRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const base = '/teams/:teamId/mass-balance-models';
  const asRecord = (role: 'viewer' | 'editor') => requireRecordRole(em, SITE_RECORD_KINDS.massBalanceModel, role);
  const actorId = (res: Parameters<RequestHandler>[1]) => currentUserId(res);

  router.get(base, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const models = await em.find(MassBalanceModel, { team: currentMembership(res).team.id }, { orderBy: { name: 'asc', createdAt: 'asc' } });
    res.json(models.map(toModelView));
  });

  router.post(base, requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(createMassBalanceModelRequestSchema, req.body);
    res.status(201).json(await createMassBalanceModel(em, { teamId: currentMembership(res).team.id, actorId: actorId(res), request }));
  });

  router.get(`${base}/export.csv`, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const team = currentMembership(res).team;
    const models = (await em.find(MassBalanceModel, { team: team.id }, { orderBy: { name: 'asc' } })).map(toModelView);
    const csv = modelListCsv(models);
    res.attachment(downloadName(`${team.getEntity().name}-mass-balance-models`, 'csv')).type('text/csv; charset=utf-8').send(csv);
  });

  router.get('/mass-balance-models/:id', requireUser, asRecord('viewer'), async (_req, res) => {
    res.json(toModelView(await em.findOneOrFail(MassBalanceModel, currentRecordId(res))));
  });

  router.get('/mass-balance-models/:id/models.csv', requireUser, asRecord('viewer'), async (_req, res) => {
    const model = toModelView(await em.findOneOrFail(MassBalanceModel, currentRecordId(res)));
    res.attachment(downloadName(`${model.name}-models`, 'csv')).type('text/csv; charset=utf-8').send(solutionsCsv(model));
  });

  router.patch('/mass-balance-models/:id', requireUser, asRecord('editor'), async (req, res) => {
    const request = parseBody(updateMassBalanceModelRequestSchema, req.body);
    res.json(await updateMassBalanceModel(em, { id: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.post('/mass-balance-models/:id/solve', requireUser, asRecord('editor'), async (_req, res) => {
    res.json(await resolveMassBalanceModel(em, currentRecordId(res), actorId(res)));
  });

  router.delete('/mass-balance-models/:id', requireUser, asRecord('editor'), async (_req, res) => {
    await deleteMassBalanceModel(em, currentRecordId(res), actorId(res));
    res.status(204).end();
  });

  return router;
}
