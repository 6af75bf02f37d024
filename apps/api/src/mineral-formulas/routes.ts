import type { EntityManager } from '@mikro-orm/postgresql';
import { recalculateFormulaRequestSchema, saveMineralFormulaRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { writeCsv } from '../site-data/csv-table';
import { downloadName } from '../site-data/upload';
import { requireTeamRole } from '../teams/require-team-role';
import { MineralFormula } from './mineral-formula.entity';
import { recalculate } from './recalculate';
import { saveMineralFormula } from './save-mineral-formula';
import { toMineralFormulaView } from './to-mineral-formula-view';

/**
 * Mineral formulas from oxide analyses: `POST /api/teams/:teamId/mineral-formulas/recalculate` (viewer+, saves nothing),
 * `GET/POST /api/teams/:teamId/mineral-formulas` (viewer / editor+), `GET …/export.csv` (viewer+).
 */
export function mineralFormulaRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  const base = '/teams/:teamId/mineral-formulas';

  router.post(`${base}/recalculate`, requireUser, requireTeamRole(em, 'viewer'), (req, res) => {
    res.json(recalculate(parseBody(recalculateFormulaRequestSchema, req.body)));
  });

  router.get(base, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const records = await em.find(MineralFormula, { team: currentMembership(res).team.id }, { orderBy: { createdAt: 'desc' }, populate: ['createdBy'] });
    res.json(records.map(toMineralFormulaView));
  });

  router.post(base, requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(saveMineralFormulaRequestSchema, req.body);
    res.status(201).json(await saveMineralFormula(em, { teamId: currentMembership(res).team.id, actorId: currentUserId(res), request }));
  });

  router.get(`${base}/export.csv`, requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const team = currentMembership(res).team;
    const records = (await em.find(MineralFormula, { team: team.id }, { orderBy: { createdAt: 'asc' }, populate: ['createdBy'] })).map(toMineralFormulaView);
    const header = ['name', 'sample', 'formula', 'basis', 'oxide_total_wt_pct', 'cation_total', 'end_members', 'weathering_reaction', 'proton_per_mole', 'warnings', 'oxides_wt_pct', 'saved_by', 'saved_at'];
    const rows = records.map((record) => [
      record.name,
      record.sampleName,
      record.result.formula,
      record.basis,
      Number(record.result.oxideTotal.toFixed(2)),
      Number(record.result.total.toFixed(4)),
      Object.entries(record.result.endMembers ?? {}).map(([key, value]) => `${key}=${value.toFixed(3)}`).join(' '),
      record.result.weathering.equation,
      record.result.protonBudget?.perMole ?? null,
      record.result.warnings.map((warning) => warning.code).join(' '),
      Object.entries(record.analysis.oxides).map(([key, value]) => `${key}=${value}`).join(' '),
      record.createdBy?.displayName ?? null,
      record.createdAt,
    ]);
    res.attachment(downloadName(`${team.getEntity().name}-mineral-formulas`, 'csv')).type('text/csv; charset=utf-8').send(writeCsv(header, rows));
  });

  return router;
}
