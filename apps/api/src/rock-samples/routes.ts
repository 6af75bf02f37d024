import type { EntityManager } from '@mikro-orm/postgresql';
import { createRockSampleRequestSchema, rockSampleListQuerySchema, updateRockSampleRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { SITE_RECORD_KINDS } from '../site-data/record-kinds';
import { csvUpload, downloadName, uploadedCsv } from '../site-data/upload';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { importRockCsv, previewRockCsv } from './import-rock-samples';
import { listRockSamples } from './list-rock-samples';
import { rockCsvTemplate, rockSamplesCsv } from './rock-csv';
import { RockSample } from './rock-sample.entity';
import { createRockSample, deleteRockSample, updateRockSample } from './save-rock-sample';
import { toRockView } from './to-rock-view';

/**
 * Rock samples (viewers read, editors write): `GET/POST /api/teams/:teamId/rock-samples`,
 * `GET …/export.csv`, `GET …/template.csv`, `POST …/import/preview`, `POST …/import`,
 * `GET/PATCH/DELETE /api/rock-samples/:id`.
 */
export function rockSampleRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const base = '/teams/:teamId/rock-samples';
  const asRecord = (role: 'viewer' | 'editor') => requireRecordRole(em, SITE_RECORD_KINDS.rockSample, role);
  const teamId = (res: Parameters<RequestHandler>[1]) => currentMembership(res).team.id;

  router.get(base, requireUser, requireTeamRole(em, 'viewer'), async (req, res) => {
    const { site } = parseBody(rockSampleListQuerySchema, req.query);
    res.json(await listRockSamples(em, teamId(res), site));
  });

  router.post(base, requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(createRockSampleRequestSchema, req.body);
    res.status(201).json(await createRockSample(em, { teamId: teamId(res), actorId: currentUserId(res), request }));
  });

  router.get(`${base}/export.csv`, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const csv = rockSamplesCsv(await listRockSamples(em, teamId(res)));
    res.attachment(downloadName(`${currentMembership(res).team.getEntity().name}-rock-samples`, 'csv')).type('text/csv; charset=utf-8').send(csv);
  });

  router.get(`${base}/template.csv`, requireUser, requireTeamRole(em, 'viewer'), (_req, res) => {
    res.attachment('rock-samples-template.csv').type('text/csv; charset=utf-8').send(rockCsvTemplate());
  });

  router.post(`${base}/import/preview`, requireUser, requireTeamRole(em, 'editor'), csvUpload(), async (req, res) => {
    res.json(await previewRockCsv(em, teamId(res), uploadedCsv(req).file));
  });

  router.post(`${base}/import`, requireUser, requireTeamRole(em, 'editor'), csvUpload(), async (req, res) => {
    res.status(201).json(await importRockCsv(em, { teamId: teamId(res), actorId: currentUserId(res), ...uploadedCsv(req) }));
  });

  router.get('/rock-samples/:id', requireUser, asRecord('viewer'), async (_req, res) => {
    const row = await em.findOneOrFail(RockSample, currentRecordId(res));
    res.json(toRockView(row, await loadTeamSettings(em, row.team.id)));
  });

  router.patch('/rock-samples/:id', requireUser, asRecord('editor'), async (req, res) => {
    const request = parseBody(updateRockSampleRequestSchema, req.body);
    res.json(await updateRockSample(em, { id: currentRecordId(res), actorId: currentUserId(res), request }));
  });

  router.delete('/rock-samples/:id', requireUser, asRecord('editor'), async (_req, res) => {
    await deleteRockSample(em, currentRecordId(res), currentUserId(res));
    res.status(204).end();
  });

  return router;
}
