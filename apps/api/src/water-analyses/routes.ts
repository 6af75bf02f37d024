import type { EntityManager } from '@mikro-orm/postgresql';
import { createWaterAnalysisRequestSchema, updateWaterAnalysisRequestSchema, waterAnalysisListQuerySchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { SITE_RECORD_KINDS } from '../site-data/record-kinds';
import { csvUpload, downloadName, uploadedCsv } from '../site-data/upload';
import { requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { importWaterCsv, previewWaterCsv } from './import-water-analyses';
import { getWaterAnalysis, listWaterAnalyses } from './list-water-analyses';
import { createWaterAnalysis, deleteWaterAnalysis, updateWaterAnalysis } from './save-water-analysis';
import { waterAnalysesCsv, waterCsvTemplate } from './water-csv';

/**
 * Water analyses (viewers read, editors write): `GET/POST /api/teams/:teamId/water-analyses`,
 * `GET …/export.csv`, `GET …/template.csv`, `POST …/import/preview`, `POST …/import`,
 * `GET/PATCH/DELETE /api/water-analyses/:id`.
 */
export function waterAnalysisRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const base = '/teams/:teamId/water-analyses';
  const asRecord = (role: 'viewer' | 'editor') => requireRecordRole(em, SITE_RECORD_KINDS.waterAnalysis, role);
  const teamId = (res: Parameters<RequestHandler>[1]) => currentMembership(res).team.id;

  router.get(base, requireUser, requireTeamRole(em, 'viewer'), async (req, res) => {
    const { site } = parseBody(waterAnalysisListQuerySchema, req.query);
    res.json(await listWaterAnalyses(em, teamId(res), site));
  });

  router.post(base, requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(createWaterAnalysisRequestSchema, req.body);
    res.status(201).json(await createWaterAnalysis(em, { teamId: teamId(res), actorId: currentUserId(res), request }));
  });

  router.get(`${base}/export.csv`, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const csv = waterAnalysesCsv(await listWaterAnalyses(em, teamId(res)));
    res.attachment(downloadName(`${currentMembership(res).team.getEntity().name}-water-analyses`, 'csv')).type('text/csv; charset=utf-8').send(csv);
  });

  router.get(`${base}/template.csv`, requireUser, requireTeamRole(em, 'viewer'), (_req, res) => {
    res.attachment('water-analyses-template.csv').type('text/csv; charset=utf-8').send(waterCsvTemplate());
  });

  router.post(`${base}/import/preview`, requireUser, requireTeamRole(em, 'editor'), csvUpload(), async (req, res) => {
    res.json(await previewWaterCsv(em, teamId(res), uploadedCsv(req).file));
  });

  router.post(`${base}/import`, requireUser, requireTeamRole(em, 'editor'), csvUpload(), async (req, res) => {
    res.status(201).json(await importWaterCsv(em, { teamId: teamId(res), actorId: currentUserId(res), ...uploadedCsv(req) }));
  });

  router.get('/water-analyses/:id', requireUser, asRecord('viewer'), async (_req, res) => {
    res.json(await getWaterAnalysis(em, currentRecordId(res)));
  });

  router.patch('/water-analyses/:id', requireUser, asRecord('editor'), async (req, res) => {
    const request = parseBody(updateWaterAnalysisRequestSchema, req.body);
    res.json(await updateWaterAnalysis(em, { id: currentRecordId(res), actorId: currentUserId(res), request }));
  });

  router.delete('/water-analyses/:id', requireUser, asRecord('editor'), async (_req, res) => {
    await deleteWaterAnalysis(em, currentRecordId(res), currentUserId(res));
    res.status(204).end();
  });

  return router;
}
