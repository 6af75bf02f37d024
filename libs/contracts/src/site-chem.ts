import { z } from 'zod';
import { massBalanceConstraintSchema, phaseRuleSchema } from './mass-balance';
import { oxideAnalysisSchema } from './mineral-formulas';

/**
 * Stateless site computations for scripts and the client (any signed-in user,
 * rate limited like the other `/api/chem/*` routes). Answers are exactly the
 * JSON of the command line (`npm run chem -- mass-balance|oxides|co2 … --json`).
 */

/** Body of `POST /api/chem/mass-balance`: the command line's model file (waters in mmol/kg). Answers 200 with status `invalid` and the error for bad input. */
export const chemMassBalanceRequestSchema = z.object({
  initial: z.record(z.string().max(20), z.union([z.number(), z.string().max(40)])),
  final: z.record(z.string().max(20), z.union([z.number(), z.string().max(40)])),
  phases: z
    .array(
      z.object({
        name: z.string().max(80),
        formula: z.string().max(200).optional(),
        equation: z.string().max(2_000).optional(),
        rule: phaseRuleSchema.optional(),
      }),
    )
    .max(20),
  constraints: z.array(massBalanceConstraintSchema).max(20),
  uncertainty: z.record(z.string().max(20), z.number()).optional(),
});
export type ChemMassBalanceRequest = z.infer<typeof chemMassBalanceRequestSchema>;

/** Answer of `POST /api/chem/mass-balance`: `{status, constraints, change, models: [{phases, transfers, valid, residuals?, robust?, ranges?}], notes, error?}` with exact text. */
export const chemMassBalanceResponseSchema = z.object({
  status: z.enum(['exact', 'least-squares', 'none', 'invalid']),
  constraints: z.array(z.string()),
  change: z.record(z.string(), z.string()),
  models: z.array(
    z.object({
      phases: z.array(z.string()),
      transfers: z.record(z.string(), z.string()),
      valid: z.boolean(),
      residuals: z.record(z.string(), z.number()).optional(),
      robust: z.boolean().optional(),
      ranges: z.record(z.string(), z.tuple([z.number(), z.number()])).optional(),
    }),
  ),
  notes: z.array(z.string()),
  error: z.object({ code: z.string(), message: z.string(), span: z.object({ start: z.number(), end: z.number() }), details: z.record(z.string(), z.unknown()) }).optional(),
});
export type ChemMassBalanceResponse = z.infer<typeof chemMassBalanceResponseSchema>;

/** Body of `POST /api/chem/oxides`: the command line's analysis file. Bad input answers 422 (`OXIDES_*`) at the field's path. */
export const chemOxidesRequestSchema = oxideAnalysisSchema;
export type ChemOxidesRequest = z.infer<typeof chemOxidesRequestSchema>;

/** Body of `POST /api/chem/co2`. A formula that does not parse answers 422 at path `formula`. */
export const chemCo2RequestSchema = z.object({
  formula: z.string().min(1).max(500),
});
export type ChemCo2Request = z.infer<typeof chemCo2RequestSchema>;

/** Answer of `POST /api/chem/co2`: t CO2 per t, both end points. */
export const chemCo2ResponseSchema = z.object({
  formula: z.string(),
  bicarbonate: z.number(),
  carbonate: z.number(),
  molCo2PerMole: z.object({ bicarbonate: z.string(), carbonate: z.string() }),
  cautions: z.array(z.string()),
});
export type ChemCo2Response = z.infer<typeof chemCo2ResponseSchema>;
