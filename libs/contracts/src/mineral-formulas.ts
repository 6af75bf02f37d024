import { z } from 'zod';
import { actorSchema } from './activity';
import { balanceJsonSchema, protonBudgetJsonSchema } from './chem-results';
import { reactionSchema } from './reactions';
import { speciesSchema } from './species';

/**
 * Mineral formulas from oxide analyses (issue 7). Routes:
 * `POST /api/teams/:teamId/mineral-formulas/recalculate` (viewer+, stateless),
 * `GET/POST /api/teams/:teamId/mineral-formulas` (viewer / editor+: saved analyses; POST saves the
 * formula as a species of the team catalogue with its provenance, and its weathering reaction),
 * `GET /api/teams/:teamId/mineral-formulas/export.csv` (viewer+).
 * Bad oxide input answers 422 with the engine's code (`OXIDES_*`) at path `analysis.<field>`.
 */

/** Products of the generated weathering reaction. */
export const weatheringProductsSchema = z.object({
  /** Where Al goes (default kaolinite). */
  aluminium: z.enum(['kaolinite', 'gibbsite']).default('kaolinite'),
  /** Where Fe goes (default goethite, with O2). */
  iron: z.enum(['goethite', 'Fe(OH)3', 'Fe2+']).default('goethite'),
});
export type WeatheringProductsChoice = z.infer<typeof weatheringProductsSchema>;

/** An oxide analysis and how to recalculate it (libs/chem `recalculateFormula`). */
export const oxideAnalysisSchema = z.object({
  /** Weight percent by oxide key (`SiO2`, `Al2O3`, `FeO`, `FeOT`, `Fe2O3T`, `MgO`, `CaO`, `Na2O`, `K2O`, …). */
  oxides: z.record(z.string().min(1).max(10), z.number().min(0).max(100)),
  /** Oxygens per formula unit; default from `group`. */
  oxygens: z.number().positive().max(100).optional(),
  /** `feldspar` (8 O), `olivine` (4), `pyroxene` (6), `garnet` (12), `spinel` (4), `ilmenite` (3), `mica` (22), `amphibole` (23). */
  group: z.string().min(1).max(40).optional(),
  /** `droop`: estimate Fe3+ after Droop (1987). */
  ferric: z.literal('droop').optional(),
  /** Ideal cations per formula unit (Droop's T); default from `group`. */
  cations: z.number().positive().max(100).optional(),
  volatiles: z.enum(['exclude', 'include']).optional(),
});
export type OxideAnalysisRequest = z.infer<typeof oxideAnalysisSchema>;

/** Body of `POST /api/teams/:teamId/mineral-formulas/recalculate` (viewer+). */
export const recalculateFormulaRequestSchema = z.object({
  analysis: oxideAnalysisSchema,
  /** Decimals of the formula text (apfu rounded), default 3. */
  decimals: z.number().int().min(1).max(4).default(3),
  products: weatheringProductsSchema.default({ aluminium: 'kaolinite', iron: 'goethite' }),
});
export type RecalculateFormulaRequest = z.infer<typeof recalculateFormulaRequestSchema>;

/** The recalculated formula (libs/chem's result), its text and weathering reaction with its proton budget. */
export const formulaRecalculationSchema = z.object({
  apfu: z.record(z.string(), z.number()),
  oxygens: z.number(),
  total: z.number(),
  oxideTotal: z.number(),
  ferricIron: z
    .object({
      method: z.enum(['droop', 'analysed']),
      ferrous: z.number(),
      ferric: z.number(),
      observedCations: z.number().optional(),
      idealCations: z.number().optional(),
    })
    .optional(),
  endMembers: z.record(z.string(), z.number()).optional(),
  /** `OXIDE_WARNINGS` of libs/chem (Droop not applicable to micas, totals out of range, …). */
  warnings: z.array(z.object({ code: z.string(), message: z.string() })),
  /** Parseable formula text, apfu rounded to `decimals` (read back as exact decimals). */
  formula: z.string(),
  molarMass: z.number(),
  /** The weathering reaction of 1 mol of the formula (balanced by libs/chem). */
  weathering: balanceJsonSchema,
  /** Its proton budget per mole of the mineral (null when it does not balance). */
  protonBudget: protonBudgetJsonSchema.nullable(),
});
export type FormulaRecalculationView = z.infer<typeof formulaRecalculationSchema>;

/** Body of `POST /api/teams/:teamId/mineral-formulas` (editor+). */
export const saveMineralFormulaRequestSchema = recalculateFormulaRequestSchema.extend({
  /** Species name, e.g. `Olivine Fo90 (IB-OL-1, invented)`; unique in the team catalogue (409 SPECIES_DUPLICATE). */
  name: z.string().trim().min(1).max(160),
  /** Where the analysis comes from: sample, instrument, laboratory. */
  sampleName: z.string().trim().max(200).default(''),
  notes: z.string().max(4_000).default(''),
  /** Add the weathering reaction to this reaction set of the team (a draft or returned set; a vetted set becomes a draft). */
  reactionSetId: z.uuid().nullable().default(null),
  reactionName: z.string().trim().min(1).max(200).optional(),
});
export type SaveMineralFormulaRequest = z.infer<typeof saveMineralFormulaRequestSchema>;
export type SaveMineralFormulaInput = z.input<typeof saveMineralFormulaRequestSchema>;

/** A saved recalculation: the provenance of a species made from an oxide analysis. */
export const mineralFormulaSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  /** The catalogue species; null when it has since been deleted. */
  speciesId: z.uuid().nullable(),
  name: z.string(),
  sampleName: z.string(),
  analysis: oxideAnalysisSchema,
  /** e.g. `8 O (feldspar), Fe3+ after Droop (1987)`. */
  basis: z.string(),
  /** e.g. `Oxide wt% to apfu on an oxygen basis (Brady & Perkins, SERC); IUPAC 2021 atomic weights`. */
  method: z.string(),
  result: formulaRecalculationSchema,
  /** The reaction added to a set, when one was. */
  reactionId: z.uuid().nullable(),
  reactionSetId: z.uuid().nullable(),
  notes: z.string(),
  createdBy: actorSchema.nullable(),
  createdAt: z.iso.datetime(),
});
export type MineralFormula = z.infer<typeof mineralFormulaSchema>;

/** Answer of `POST /api/teams/:teamId/mineral-formulas` (201). */
export const saveMineralFormulaResponseSchema = z.object({
  mineralFormula: mineralFormulaSchema,
  species: speciesSchema,
  /** The reaction added to `reactionSetId`, or null. */
  reaction: reactionSchema.nullable(),
});
export type SaveMineralFormulaResponse = z.infer<typeof saveMineralFormulaResponseSchema>;

/** Answer of `GET /api/teams/:teamId/mineral-formulas`, newest first. */
export const mineralFormulaListResponseSchema = z.array(mineralFormulaSchema);
export type MineralFormulaListResponse = z.infer<typeof mineralFormulaListResponseSchema>;
