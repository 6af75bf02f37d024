import type { EntityManager } from '@mikro-orm/postgresql';
import { exportQuerySchema, IMPORT_FILE_FIELD, IMPORT_MAX_BYTES } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { BadRequestError } from '../errors/app-errors';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { downloadName } from '../site-data/upload';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { exportSetJson, toCsv } from './export-set';
import { importSet } from './import-set';

/**
 * Import and export: `GET /api/reaction-sets/:id/export?format=json|csv` (viewer+),
 * `POST /api/teams/:teamId/reaction-sets/import` (editor+, multipart field `file`).
 */
export function transferRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: IMPORT_MAX_BYTES, files: 1 } });

  router.get('/reaction-sets/:id/export', requireUser, requireRecordRole(em, RECORD_KINDS.reactionSet, 'viewer'), async (req, res) => {
    const { format } = parseBody(exportQuerySchema, req.query);
    if (format === 'csv') {
      const detail = await getReactionSet(em, currentRecordId(res));
      res.attachment(downloadName(detail.name, 'csv', 'reaction-set')).type('text/csv; charset=utf-8').send(toCsv(detail));
      return;
    }
    const file = await exportSetJson(em, currentRecordId(res));
    res.attachment(downloadName(file.set.name, 'json', 'reaction-set')).json(file);
  });

  router.post('/teams/:teamId/reaction-sets/import', requireUser, requireTeamRole(em, 'editor'), upload.single(IMPORT_FILE_FIELD), async (req, res) => {
    if (!req.file) {
      throw new BadRequestError('IMPORT_INVALID', `Send the file as multipart/form-data in the field "${IMPORT_FILE_FIELD}".`, [
        { code: 'IMPORT_NO_FILE', message: 'No file was uploaded.', path: [IMPORT_FILE_FIELD] },
      ]);
    }
    res.status(201).json(await importSet(em, { teamId: currentMembership(res).team.id, actorId: currentUserId(res), file: req.file.buffer }));
  });

  return router;
}
