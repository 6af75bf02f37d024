import { z } from 'zod';
import { chemIssueSchema } from './chem-results';

/**
 * Inverse mass-balance models of a team (issue 6). Routes:
 * `GET/POST /api/teams/:teamId/mass-balance-models` (viewer / editor+),
 * `GET/PATCH/DELETE /api/mass-balance-models/:id` (viewer / editor+ / editor+),
 * `POST /api/mass-balance-models/:id/solve` (editor+: solve again with the current waters and species, store),
 * `GET /api/mass-balance-models/:id/models.csv` (viewer+: the table of models and transfers),
 * `GET /api/teams/:teamId/mass-balance-models/export.csv` (viewer+: every model's definition and first model).
 *
 * The server solves on every save (and when a water or species it uses is
 * re-solved through `/solve`) with libs/chem's `solveMassBalance` and stores
 * the result. Waters are converted from their reported units to mmol/L with
 * IUPAC 2021 molar masses and used as mmol/kg of water: mmol/L ≈ mmol/kg for
 * dilute waters (density ≈ 1 kg/L, dissolved solids ≪ 1 %), an assumption
 * every result states. Values reported in mmol/L are passed exactly as written;
 * converted values are rounded to 6 significant digits.
 */

/** Id of a mass-balance model in a route; anything else answers 404. */
export const massBalanceModelIdSchema = z.uuid();

/** How a phase may move: `dissolve` (transfer ≥ 0), `precipitate` (≤ 0), `either`. */
export const PHASE_RULES = ['dissolve', 'precipitate', 'either'] as const;
export const phaseRuleSchema = z.enum(PHASE_RULES);
export type PhaseRuleName = z.infer<typeof phaseRuleSchema>;

/**
 * A candidate phase: exactly one of a species of the team's or the built-in
 * catalogue (`speciesId`, a UUID or `builtin:<key>`; its formula is used), a
 * formula (`CaCO3`, `CO2(g)`, `O2`), or a balanced reaction (`Ca^2+ + 2 NaX -> CaX2 + 2 Na+`, X the exchange site).
 */
export const massBalancePhaseSchema = z
  .object({
    name: z.string().trim().min(1).max(80),
    speciesId: z.string().min(1).max(80).optional(),
    formula: z.string().trim().min(1).max(200).optional(),
    equation: z.string().trim().min(1).max(2_000).optional(),
    rule: phaseRuleSchema.default('either'),
  })
  .refine((phase) => [phase.speciesId, phase.formula, phase.equation].filter((value) => value !== undefined).length === 1, {
    message: 'Give exactly one of speciesId, formula or equation',
  });
export type MassBalancePhase = z.infer<typeof massBalancePhaseSchema>;

/** A constraint: an element symbol, `charge` or `electrons`. */
export const massBalanceConstraintSchema = z.union([z.string().regex(/^[A-Z][a-z]?$/, 'An element symbol such as Ca'), z.literal('charge'), z.literal('electrons')]);

/** Body of `POST /api/teams/:teamId/mass-balance-models` (editor+). `initialWaterId: null` is pure water. */
export const createMassBalanceModelRequestSchema = z.object({
  name: z.string().trim().min(1).max(200),
  description: z.string().max(4_000).default(''),
  initialWaterId: z.uuid().nullable(),
  finalWaterId: z.uuid(),
  phases: z.array(massBalancePhaseSchema).min(1).max(20),
  constraints: z.array(massBalanceConstraintSchema).min(1).max(20),
  /** Relative uncertainty in % of each reported concentration, by solute key (both waters). */
  uncertainty: z.record(z.string().min(1).max(20), z.number().nonnegative().max(100)).default({}),
});
export type CreateMassBalanceModelRequest = z.infer<typeof createMassBalanceModelRequestSchema>;
export type CreateMassBalanceModelInput = z.input<typeof createMassBalanceModelRequestSchema>;

/** Body of `PATCH /api/mass-balance-models/:id` (editor+): changed fields and the version read. */
export const updateMassBalanceModelRequestSchema = z.object({
  name: z.string().trim().min(1).max(200).optional(),
  description: z.string().max(4_000).optional(),
  initialWaterId: z.uuid().nullable().optional(),
  finalWaterId: z.uuid().optional(),
  phases: z.array(massBalancePhaseSchema).min(1).max(20).optional(),
  constraints: z.array(massBalanceConstraintSchema).min(1).max(20).optional(),
  uncertainty: z.record(z.string().min(1).max(20), z.number().nonnegative().max(100)).optional(),
  version: z.number().int().positive(),
});
export type UpdateMassBalanceModelRequest = z.infer<typeof updateMassBalanceModelRequestSchema>;

/** One water as the solver used it. */
export const massBalanceWaterSchema = z.object({
  /** `null` for pure water. */
  analysisId: z.uuid().nullable(),
  name: z.string(),
  /** mmol per kg of water by solute key, exact decimal text; below detection as `<limit` (counted 0). */
  mmolPerKg: z.record(z.string(), z.string()),
});
export type MassBalanceWater = z.infer<typeof massBalanceWaterSchema>;

/** One model of the solver, with its implied net reaction. */
export const massBalanceSolutionSchema = z.object({
  phases: z.array(z.string()),
  /** Exact transfers in mmol/kg of water (+ dissolved, − precipitated), e.g. `"17/250"`. */
  transfers: z.record(z.string(), z.string()),
  /** The same transfers as numbers, for charts. */
  transfersDecimal: z.record(z.string(), z.number()),
  /** Whether every transfer obeys its phase's rule. */
  valid: z.boolean(),
  /** Least-squares models: Δ − fit per constraint. */
  residuals: z.record(z.string(), z.number()).optional(),
  /** With uncertainty: valid and every transfer keeps its sign over the whole band. */
  robust: z.boolean().optional(),
  ranges: z.record(z.string(), z.tuple([z.number(), z.number()])).optional(),
  /** The net reaction the model implies (libs/chem `impliedReaction`), per kg water in mmol. */
  impliedReaction: z.object({ status: z.string(), equation: z.string().nullable() }),
});
export type MassBalanceSolution = z.infer<typeof massBalanceSolutionSchema>;

/** The stored result of a model. */
export const massBalanceResultSchema = z.object({
  status: z.enum(['exact', 'least-squares', 'none', 'invalid']),
  constraints: z.array(z.string()),
  /** Δ of each constraint, final − initial, exact text. */
  change: z.record(z.string(), z.string()),
  /** Valid models first, then fewer phases. */
  models: z.array(massBalanceSolutionSchema),
  notes: z.array(z.string()),
  /** For `invalid`: the engine's error; `path` is the request field it is about (e.g. `['phases', 2, 'equation']`). */
  error: chemIssueSchema.extend({ path: z.array(z.union([z.string(), z.number()])) }).nullable(),
  initial: massBalanceWaterSchema,
  final: massBalanceWaterSchema,
  /** Assumptions every result states (mmol/L ≈ mmol/kg; Fe as Fe2+; …). */
  assumptions: z.array(z.string()),
  solvedAt: z.iso.datetime(),
});
export type MassBalanceResultView = z.infer<typeof massBalanceResultSchema>;

/** A mass-balance model with its stored result. Phases given by `speciesId` carry the `formula` used. */
export const massBalanceModelSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  name: z.string(),
  description: z.string(),
  initialWaterId: z.uuid().nullable(),
  finalWaterId: z.uuid(),
  phases: z.array(
    z.object({
      name: z.string(),
      speciesId: z.string().nullable(),
      formula: z.string().nullable(),
      equation: z.string().nullable(),
      rule: phaseRuleSchema,
    }),
  ),
  constraints: z.array(z.string()),
  uncertainty: z.record(z.string(), z.number()),
  result: massBalanceResultSchema,
  version: z.number().int().positive(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type MassBalanceModel = z.infer<typeof massBalanceModelSchema>;

/** Answer of `GET /api/teams/:teamId/mass-balance-models`, by name. */
export const massBalanceModelListResponseSchema = z.array(massBalanceModelSchema);
export type MassBalanceModelListResponse = z.infer<typeof massBalanceModelListResponseSchema>;

/** Columns of `GET /api/mass-balance-models/:id/models.csv`: one row per model, then one `transfer:<phase>` column per candidate phase (mmol/kg, exact). */
export const MASS_BALANCE_MODELS_CSV_COLUMNS = ['model', 'phases', 'valid', 'robust', 'implied_reaction', 'residuals'] as const;
