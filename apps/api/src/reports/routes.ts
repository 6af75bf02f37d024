import type { EntityManager } from '@mikro-orm/postgresql';
import { siteReportQuerySchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId } from '../http/locals';
import { parseBody } from '../http/validate';
import { downloadName } from '../site-data/upload';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { buildSetReport, buildSiteReport } from './build-reports';
import { listSites } from './list-sites';
import { renderPdf } from './pdf-document';

/**
 * PDF reports (viewer+): `GET /api/reaction-sets/:id/report.pdf`,
 * `GET /api/teams/:teamId/site-report.pdf?site=`, and `GET /api/teams/:teamId/sites` to choose a site.
 */
export function reportRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();

  router.get('/reaction-sets/:id/report.pdf', requireUser, requireRecordRole(em, RECORD_KINDS.reactionSet, 'viewer'), async (_req, res) => {
    const { document, fileBase } = await buildSetReport(em, currentRecordId(res));
    res.attachment(downloadName(fileBase, 'pdf')).type('application/pdf').send(await renderPdf(document));
  });

  router.get('/teams/:teamId/site-report.pdf', requireUser, requireTeamRole(em, 'viewer'), async (req, res) => {
    const { site } = parseBody(siteReportQuerySchema, req.query);
    const { document, fileBase } = await buildSiteReport(em, currentMembership(res).team.id, site);
    res.attachment(downloadName(fileBase, 'pdf')).type('application/pdf').send(await renderPdf(document));
  });

  router.get('/teams/:teamId/sites', requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    res.json(await listSites(em, currentMembership(res).team.id));
  });

  return router;
}
