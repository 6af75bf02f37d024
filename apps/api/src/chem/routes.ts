import {
  balanceEquation,
  balanceToJson,
  checkEquation,
  checkToJson,
  combineReactions,
  combineToJson,
  isChemError,
  massToJson,
} from '@tallus/chem';
import { chemBalanceRequestSchema, chemCheckRequestSchema, chemCombineRequestSchema, chemFormulaRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { ChemInputError } from '../errors/app-errors';
import { parseBody } from '../http/validate';
import { createChemRateLimit } from './chem-rate-limit';

/**
 * Stateless computation for scripts and the client (any signed-in user, rate
 * limited per user): `POST /api/chem/balance`, `/check`, `/formula`, `/combine`.
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
    res.json(massOrInputError(formula));
  });

  router.post('/combine', (req, res) => {
    res.json(combineToJson(combineReactions(parseBody(chemCombineRequestSchema, req.body))));
  });

  return router;
}

function massOrInputError(formula: string): ReturnType<typeof massToJson> {
  try {
    return massToJson(formula);
  } catch (error) {
    // The engine's error is about the request's `formula` field: give it that path (422 with span).
    if (isChemError(error)) throw new ChemInputError(['formula'], error);
    throw error;
  }
}
