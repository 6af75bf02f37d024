import { z } from 'zod';
import { textSpanSchema } from './problem';

/**
 * The JSON forms of the chemistry engine's results (libs/chem `*ToJson`), as the
 * command line prints them and the API sends and stores them. Exact numbers are
 * text: `"15/4"`, `"-2"`.
 */

/** An exact rational as text: an integer, a decimal or a fraction, e.g. `2`, `-1`, `0.35`, `15/4`. */
export const rationalTextSchema = z
  .string()
  .trim()
  .regex(/^[+-]?\d+(\.\d+)?(\/[1-9]\d*)?$/, 'Write an exact number: 2, -1, 0.35 or 15/4');

/** A chemistry error as results carry it: code, English message, 0-based end-exclusive span in the text it is about. */
export const chemIssueSchema = z.object({
  code: z.string(),
  message: z.string(),
  span: textSpanSchema,
});
export type ChemIssueJson = z.infer<typeof chemIssueSchema>;

/** A warning of the engine (e.g. `BALANCE_SPECIES_MOVED`), optionally naming a species and a span. */
export const chemWarningSchema = z.object({
  code: z.string(),
  message: z.string(),
  species: z.string().optional(),
  span: textSpanSchema.optional(),
});
export type ChemWarningJson = z.infer<typeof chemWarningSchema>;

/** Statuses of a reaction's balance (DESIGN.md §2). */
export const BALANCE_STATUSES = ['balanced', 'unbalanced', 'open', 'impossible', 'invalid'] as const;
export const balanceStatusSchema = z.enum(BALANCE_STATUSES);
export type BalanceStatus = z.infer<typeof balanceStatusSchema>;

/** One side of an equation. */
export const sideSchema = z.enum(['left', 'right']);

/** JSON of `balanceEquation` (`balanceToJson`). */
export const balanceJsonSchema = z.object({
  status: balanceStatusSchema,
  freedom: z.number().int(),
  terms: z.array(z.object({ formula: z.string(), side: sideSchema, coefficient: z.string().nullable() })),
  equation: z.string().nullable(),
  warnings: z.array(chemWarningSchema),
  missing: z.array(z.string()).optional(),
  balances: z.array(z.string()).optional(),
  error: chemIssueSchema.optional(),
});
export type BalanceJson = z.infer<typeof balanceJsonSchema>;

/** Proton budget: net H+ made (+) or used (−) per mole of the reference species, per kg of it, per tonne of rock, as kg CaCO3/t. */
export const protonBudgetJsonSchema = z.object({
  reference: z.string(),
  perMole: z.string(),
  perKg: z.number().nullable(),
  perTonneRock: z.number().nullable(),
  caco3KgPerTonne: z.number().nullable(),
});
export type ProtonBudgetJson = z.infer<typeof protonBudgetJsonSchema>;

/** JSON of `checkEquation` (`checkToJson`). */
export const checkJsonSchema = z.object({
  status: z.enum(['balanced', 'unbalanced', 'invalid']),
  residuals: z.record(z.string(), z.string()),
  electrons: z.record(z.string(), z.string()),
  electronsTransferred: z.string().nullable(),
  o2Demand: z.string().nullable(),
  protonBudget: protonBudgetJsonSchema.nullable(),
  warnings: z.array(chemWarningSchema),
  error: chemIssueSchema.optional(),
});
export type CheckJson = z.infer<typeof checkJsonSchema>;

/** JSON of `massToJson`: molar mass in g/mol (IUPAC 2021 abridged weights), exact composition and charge. */
export const massJsonSchema = z.object({
  formula: z.string(),
  molarMass: z.number(),
  composition: z.record(z.string(), z.string()),
  charge: z.string(),
});
export type MassJson = z.infer<typeof massJsonSchema>;

/** Statuses of a net reaction. */
export const COMBINE_STATUSES = ['combined', 'none', 'several', 'invalid'] as const;
export const combineStatusSchema = z.enum(COMBINE_STATUSES);
export type CombineStatus = z.infer<typeof combineStatusSchema>;

/** JSON of `combineReactions` (`combineToJson`). `error.reaction` / `error.cancel` index the input at fault. */
export const combineJsonSchema = z.object({
  status: combineStatusSchema,
  multipliers: z.array(z.string().nullable()),
  equation: z.string().nullable(),
  terms: z.array(z.object({ formula: z.string(), side: sideSchema, coefficient: z.string() })),
  freedom: z.number().int(),
  warnings: z.array(chemWarningSchema),
  error: chemIssueSchema.extend({ reaction: z.number().int().optional(), cancel: z.number().int().optional() }).optional(),
});
export type CombineJson = z.infer<typeof combineJsonSchema>;
