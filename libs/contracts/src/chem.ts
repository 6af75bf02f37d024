import { z } from 'zod';
import { rationalTextSchema } from './chem-results';

/**
 * Bodies of the stateless computation routes `POST /api/chem/*` (any signed-in
 * user). Answers are the engine's JSON, identical to `npm run chem -- <command> --json`:
 * balance → {@link balanceJsonSchema}, check → {@link checkJsonSchema},
 * formula → {@link massJsonSchema}, combine → {@link combineJsonSchema}.
 * Text that does not parse is not a request error: balance, check and combine
 * answer 200 with status `invalid` and the error's span; formula answers 422 with
 * the span at path `formula`.
 */

const equationTextSchema = z.string().max(2_000);
const formulaTextSchema = z.string().max(500);

/** Body of `POST /api/chem/balance`. */
export const chemBalanceRequestSchema = z.object({
  equation: equationTextSchema,
  /** Scale the result to 1 mol of this species (as written in the equation). */
  normalizeTo: formulaTextSchema.optional(),
  /** Fixed coefficients by formula, e.g. `{"FeS2": "1"}`. */
  pins: z.record(formulaTextSchema, z.union([rationalTextSchema, z.number()])).optional(),
});
export type ChemBalanceRequest = z.infer<typeof chemBalanceRequestSchema>;

/** Explicit oxidation states by formula, e.g. `{"FeS2": {"Fe": "2", "S": "-1"}}`. */
export const oxidationStateMapSchema = z.record(formulaTextSchema, z.record(z.string().regex(/^[A-Z][a-z]?$/), z.union([rationalTextSchema, z.number()])));
export type OxidationStateMapJson = z.infer<typeof oxidationStateMapSchema>;

/** Body of `POST /api/chem/check`. */
export const chemCheckRequestSchema = z.object({
  equation: equationTextSchema,
  /** Reference species of the proton budget; default the first left-hand species. */
  reference: formulaTextSchema.optional(),
  /** Weight percent of the reference species in the rock, for per-tonne figures. */
  rockWeightPercent: z.number().positive().max(100).optional(),
  oxidationStates: oxidationStateMapSchema.optional(),
});
export type ChemCheckRequest = z.infer<typeof chemCheckRequestSchema>;

/** Body of `POST /api/chem/formula`. */
export const chemFormulaRequestSchema = z.object({
  formula: formulaTextSchema,
});
export type ChemFormulaRequest = z.infer<typeof chemFormulaRequestSchema>;

/** Body of `POST /api/chem/combine` (the command line's combine file). */
export const chemCombineRequestSchema = z.object({
  reactions: z
    .array(z.object({ equation: equationTextSchema, multiplier: z.union([rationalTextSchema, z.number()]).optional() }))
    .min(1)
    .max(50),
  cancel: z.array(formulaTextSchema).max(50),
});
export type ChemCombineRequest = z.infer<typeof chemCombineRequestSchema>;
