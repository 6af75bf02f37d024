import {
  balanceEquation,
  balanceToJson,
  checkEquation,
  checkToJson,
  combineReactions,
  combineToJson,
  massToJson,
  formulaText,
  mineralCo2Uptake,
  recalculateFormula,
  solveMassBalance,
} from '@tallus/chem';
import {
  chemBalanceRequestSchema,
  chemCheckRequestSchema,
  chemCo2RequestSchema,
  chemCombineRequestSchema,
  chemFormulaRequestSchema,
  chemMassBalanceRequestSchema,
  chemOxidesRequestSchema,
} from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { withChemPath } from '../site-data/chem-path';
import { parseBody } from '../http/validate';
import { createChemRateLimit } from './chem-rate-limit';

/**
 * Stateless computation for scripts and the client (any signed-in user, rate
 * limited per user): `POST /api/chem/balance`, `/check`, `/formula`, `/combine`,
 * and the site calculators `/mass-balance`, `/oxides`, `/co2`.
 * Answers are exactly the JSON of `npm run chem -- <command> --json`; text that does
 * not parse answers 200 with status `invalid` (balance, check, combine) or 422 at
 * path `formula` (formula).
 */
export function chemRoutes(requireUser: RequestHandler, ratePerMinute: number): Router {
  const router = Router();
  router.use(requireUser, createChemRateLimit(ratePerMinute));

  router.post('/balance', (req, res) => {
    const { equation, normalizeTo, pins } = parseBody(chemBalanceRequestSchema, req.body);
    res.json(balanceToJson(balanceEquation(equation, { normalizeTo, pins })));
  });

  router.post('/check', (req, res) => {
    const { equation, ...options } = parseBody(chemCheckRequestSchema, req.body);
    res.json(checkToJson(checkEquation(equation, options)));
  });

  router.post('/formula', (req, res) => {
    const { formula } = parseBody(chemFormulaRequestSchema, req.body);
    res.json(withChemPath(['formula'], () => massToJson(formula)));
  });

  router.post('/combine', (req, res) => {
    res.json(combineToJson(combineReactions(parseBody(chemCombineRequestSchema, req.body))));
  });

  router.post('/mass-balance', (req, res) => {
    const result = solveMassBalance(parseBody(chemMassBalanceRequestSchema, req.body));
    const { status, constraints, change, models, notes, error } = result;
    res.json({ status, constraints, change, models, notes, ...(error === undefined ? {} : { error }) });
  });

  router.post('/oxides', (req, res) => {
    const result = withChemPath([], () => recalculateFormula(parseBody(chemOxidesRequestSchema, req.body)));
    res.json({ ...result, formula: formulaText(result.apfu, { oxygens: result.oxygens, decimals: 3 }) });
  });

  router.post('/co2', (req, res) => {
    const { formula } = parseBody(chemCo2RequestSchema, req.body);
    const result = withChemPath(['formula'], () => mineralCo2Uptake(formula));
    res.json({ formula: result.formula, bicarbonate: result.bicarbonate, carbonate: result.carbonate, molCo2PerMole: result.molCo2PerMole, cautions: result.cautions });
  });

  return router;
}
