import { z } from 'zod';
import { cbeConventionSchema } from './team-settings';
import { csvImportResponseSchemaOf, csvPreviewSchemaOf } from './csv-import';

/**
 * Water analyses of a team (issue 6). Routes:
 * `GET/POST /api/teams/:teamId/water-analyses` (viewer / editor+),
 * `GET/PATCH/DELETE /api/water-analyses/:id` (viewer / editor+ / editor+),
 * `POST /api/teams/:teamId/water-analyses/import/preview` and `…/import` (editor+, multipart CSV),
 * `GET /api/teams/:teamId/water-analyses/export.csv` and `…/template.csv` (viewer+).
 *
 * Solute keys and units are libs/chem's (`SOLUTES`, `CONCENTRATION_UNITS`):
 * an unknown key or unit, or a value that is not a number or `<limit`, answers
 * 422 with the engine's code at path `solutes.<key>.unit` / `.value`.
 * Values below detection are kept as text (`"<0.01"`), never turned into 0.
 */

/** Id of a water analysis in a route; anything else answers 404. */
export const waterAnalysisIdSchema = z.uuid();

/** One reported solute: a number, or text such as `"12.5"` or `"<0.01"` (below detection), and its unit (`mg/L`, `µg/L`, `mmol/L`, `µmol/L`, `meq/L`, `mg/L as CaCO3`, `mg/L as HCO3`). */
export const soluteEntrySchema = z.object({
  value: z.union([z.number().nonnegative(), z.string().trim().min(1).max(40)]),
  unit: z.string().trim().min(1).max(40),
});
export type SoluteEntry = z.infer<typeof soluteEntrySchema>;

/** Body of `POST /api/teams/:teamId/water-analyses` (editor+). Sample names are unique in a team (409 WATER_ANALYSIS_DUPLICATE). */
export const createWaterAnalysisRequestSchema = z.object({
  name: z.string().trim().min(1).max(160),
  site: z.string().trim().max(200).default(''),
  /** Sampling date, `YYYY-MM-DD`. */
  sampledOn: z.iso.date().nullable().default(null),
  temperatureC: z.number().min(-5).max(400).nullable().default(null),
  pH: z.number().min(-2).max(16).nullable().default(null),
  /** Solutes by key (`Ca`, `SO4`, `alkalinity`, `DIC`, …). */
  solutes: z.record(z.string().trim().min(1).max(20), soluteEntrySchema),
  notes: z.string().max(4_000).default(''),
});
export type CreateWaterAnalysisRequest = z.infer<typeof createWaterAnalysisRequestSchema>;
export type CreateWaterAnalysisInput = z.input<typeof createWaterAnalysisRequestSchema>;

/** Body of `PATCH /api/water-analyses/:id` (editor+): changed fields (solutes replace the whole map) and the version read. */
export const updateWaterAnalysisRequestSchema = z.object({
  name: z.string().trim().min(1).max(160).optional(),
  site: z.string().trim().max(200).optional(),
  sampledOn: z.iso.date().nullable().optional(),
  temperatureC: z.number().min(-5).max(400).nullable().optional(),
  pH: z.number().min(-2).max(16).nullable().optional(),
  solutes: z.record(z.string().trim().min(1).max(20), soluteEntrySchema).optional(),
  notes: z.string().max(4_000).optional(),
  version: z.number().int().positive(),
});
export type UpdateWaterAnalysisRequest = z.infer<typeof updateWaterAnalysisRequestSchema>;

/** One solute converted by libs/chem (IUPAC 2021 molar masses). Below detection: the limit converted, counted 0 in sums. */
export const convertedSoluteSchema = z.object({
  label: z.string(),
  /** The formula the mass is reported as (`SO4^2-`, `SiO2`, `C` for DIC). */
  formula: z.string(),
  charge: z.number().int(),
  mmolPerL: z.number(),
  /** |charge| × mmol/L; 0 for neutral solutes. */
  meqPerL: z.number(),
  belowDetection: z.boolean(),
  detectionLimit: z.number().nullable(),
});
export type ConvertedSolute = z.infer<typeof convertedSoluteSchema>;

/** Codes of the charge-balance notes (texts are libs/chem's `CHARGE_BALANCE_NOTES`). */
export const chargeBalanceNoteSchema = z.object({
  code: z.enum(['LOW_PH', 'DILUTE', 'BELOW_DETECTION', 'NO_IONS']),
  message: z.string(),
});

/** Charge balance of an analysis in meq/L, computed on every read with the team's threshold and convention. */
export const chargeBalanceSchema = z.object({
  cationsMeq: z.number(),
  anionsMeq: z.number(),
  /** H+ from pH counted with the cations (pH < 4.5 only). */
  protonsMeq: z.number(),
  /** Signed CBE in %; null without charged solutes. */
  cbePercent: z.number().nullable(),
  convention: cbeConventionSchema,
  threshold: z.number(),
  /** Whether |CBE| exceeds the team's threshold. */
  flagged: z.boolean(),
  /** meq/L of each charged solute, anions negative. */
  contributions: z.record(z.string(), z.number()),
  notes: z.array(chargeBalanceNoteSchema),
});
export type ChargeBalance = z.infer<typeof chargeBalanceSchema>;

/** A water analysis with what the server computes from it. */
export const waterAnalysisSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  name: z.string(),
  site: z.string(),
  sampledOn: z.iso.date().nullable(),
  temperatureC: z.number().nullable(),
  pH: z.number().nullable(),
  /** As reported: values are text (`"12.5"`, `"<0.01"`). */
  solutes: z.record(z.string(), z.object({ value: z.string(), unit: z.string() })),
  notes: z.string(),
  converted: z.record(z.string(), convertedSoluteSchema),
  chargeBalance: chargeBalanceSchema,
  /** Mass-balance models that use this water (it cannot be deleted while any does). */
  usedByModels: z.number().int().nonnegative(),
  version: z.number().int().positive(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type WaterAnalysis = z.infer<typeof waterAnalysisSchema>;

/** Query of `GET /api/teams/:teamId/water-analyses` (viewer+): optional site filter; ordered by site, date, name. */
export const waterAnalysisListQuerySchema = z.object({
  site: z.string().max(200).optional(),
});
export type WaterAnalysisListQuery = z.infer<typeof waterAnalysisListQuerySchema>;

/** Answer of `GET /api/teams/:teamId/water-analyses`. */
export const waterAnalysisListResponseSchema = z.array(waterAnalysisSchema);
export type WaterAnalysisListResponse = z.infer<typeof waterAnalysisListResponseSchema>;

/**
 * The CSV layout of water analyses (wide: one row per sample), read by the
 * import and written by the export and the template:
 * `sample,site,date,temperature_c,ph,notes,<solute> (<unit>),…`, e.g.
 * `Ca (mg/L)`, `alkalinity (mg/L as CaCO3)`, `Fe (µmol/L)`. Dates `YYYY-MM-DD`;
 * decimals with a point; an empty cell is "not measured"; `<0.01` is below
 * detection. Only `sample` is required. Headers are matched case-sensitively
 * for solute keys (`Ca`, `SO4`) and case-insensitively for the fixed columns.
 */
export const WATER_CSV_FIXED_COLUMNS = ['sample', 'site', 'date', 'temperature_c', 'ph', 'notes'] as const;

/** Answer of `POST /api/teams/:teamId/water-analyses/import/preview` (editor+): nothing is saved. */
export const waterAnalysisCsvPreviewSchema = csvPreviewSchemaOf(createWaterAnalysisRequestSchema);
export type WaterAnalysisCsvPreview = z.infer<typeof waterAnalysisCsvPreviewSchema>;

/** Answer of `POST /api/teams/:teamId/water-analyses/import` (editor+, 201). */
export const waterAnalysisCsvImportResponseSchema = csvImportResponseSchemaOf(waterAnalysisSchema);
export type WaterAnalysisCsvImportResponse = z.infer<typeof waterAnalysisCsvImportResponseSchema>;
