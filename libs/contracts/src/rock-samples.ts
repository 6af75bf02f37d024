import { z } from 'zod';
import { csvImportResponseSchemaOf, csvPreviewSchemaOf } from './csv-import';
import { apSulfurBasisSchema, carbonatePathwaySchema, nprBandsSchema } from './team-settings';

/**
 * Rock samples of a team (issue 7): sulfur forms, neutralisation potential,
 * paste pH, optional mineral modes and oxide analysis. Routes:
 * `GET/POST /api/teams/:teamId/rock-samples` (viewer / editor+),
 * `GET/PATCH/DELETE /api/rock-samples/:id` (viewer / editor+ / editor+),
 * `POST /api/teams/:teamId/rock-samples/import/preview` and `…/import` (editor+, multipart CSV),
 * `GET /api/teams/:teamId/rock-samples/export.csv` (the ABA table with every computed column) and `…/template.csv` (viewer+).
 *
 * Computed on every read with the team's settings (libs/chem): AP, NNP, NPR
 * and class (Sobek et al. 1978; bands of the team), mineralogical AP/NP from
 * modes through the minerals' balanced reactions, CO2 uptake from modes and
 * from the oxide analysis (Renforth 2019), with every caution.
 */

/** Id of a rock sample in a route; anything else answers 404. */
export const rockSampleIdSchema = z.uuid();

const percentSchema = z.number().min(0).max(100);

/**
 * One mineral mode. `mineral` is a name; for ABA it must be one of libs/chem's
 * `ABA_MINERALS` (pyrite, pyrrhotite, chalcopyrite, calcite, dolomite,
 * ankerite, siderite), whose formula is known. For CO2 uptake every mode needs a
 * formula: given here, or known for the ABA minerals (e.g. `forsterite` with `Mg2SiO4`).
 */
export const mineralModeSchema = z.object({
  mineral: z.string().trim().min(1).max(80),
  formula: z.string().trim().min(1).max(200).nullable().default(null),
  weightPercent: percentSchema,
});
export type MineralMode = z.infer<typeof mineralModeSchema>;

/** Body of `POST /api/teams/:teamId/rock-samples` (editor+). Names are unique in a team (409 ROCK_SAMPLE_DUPLICATE). */
export const createRockSampleRequestSchema = z.object({
  name: z.string().trim().min(1).max(160),
  site: z.string().trim().max(200).default(''),
  /** Sample interval, metres below surface (or along the hole). */
  depthFromM: z.number().min(0).max(10_000).nullable().default(null),
  depthToM: z.number().min(0).max(10_000).nullable().default(null),
  lithology: z.string().trim().max(200).default(''),
  totalSulfurPercent: percentSchema.nullable().default(null),
  sulfideSulfurPercent: percentSchema.nullable().default(null),
  sulfateSulfurPercent: percentSchema.nullable().default(null),
  /** Measured NP, kg CaCO3/t. */
  neutralisationPotential: z.number().min(0).max(2_000).nullable().default(null),
  pastePh: z.number().min(0).max(14).nullable().default(null),
  modes: z.array(mineralModeSchema).max(40).default([]),
  /** Oxide weight percents by libs/chem oxide key (`SiO2`, `CaO`, `MgO`, `Na2O`, `K2O`, `CO2`, `SO3`, …). */
  oxides: z.record(z.string().min(1).max(10), percentSchema).nullable().default(null),
  notes: z.string().max(4_000).default(''),
});
export type CreateRockSampleRequest = z.infer<typeof createRockSampleRequestSchema>;
export type CreateRockSampleInput = z.input<typeof createRockSampleRequestSchema>;

/** Body of `PATCH /api/rock-samples/:id` (editor+): changed fields (modes and oxides replace the whole value) and the version read. */
export const updateRockSampleRequestSchema = z.object({
  name: z.string().trim().min(1).max(160).optional(),
  site: z.string().trim().max(200).optional(),
  depthFromM: z.number().min(0).max(10_000).nullable().optional(),
  depthToM: z.number().min(0).max(10_000).nullable().optional(),
  lithology: z.string().trim().max(200).optional(),
  totalSulfurPercent: percentSchema.nullable().optional(),
  sulfideSulfurPercent: percentSchema.nullable().optional(),
  sulfateSulfurPercent: percentSchema.nullable().optional(),
  neutralisationPotential: z.number().min(0).max(2_000).nullable().optional(),
  pastePh: z.number().min(0).max(14).nullable().optional(),
  modes: z.array(mineralModeSchema).max(40).optional(),
  oxides: z.record(z.string().min(1).max(10), percentSchema).nullable().optional(),
  notes: z.string().max(4_000).optional(),
  version: z.number().int().positive(),
});
export type UpdateRockSampleRequest = z.infer<typeof updateRockSampleRequestSchema>;

/** Screening classes. */
export const ABA_CLASSES = ['potentially-acid-generating', 'uncertain', 'non-acid-generating'] as const;
export const abaClassSchema = z.enum(ABA_CLASSES);
export type AbaClassName = z.infer<typeof abaClassSchema>;

const noteSchema = z.object({ code: z.string(), message: z.string() });

/** AP/NNP/NPR from sulfur and the measured NP (kg CaCO3/t). */
export const rockAbaSchema = z.object({
  /** Which sulfur gave AP (`total` also when sulfide S is missing; then a TOTAL_SULFUR note). */
  sulfurBasis: apSulfurBasisSchema,
  /** kg CaCO3/t per wt% S: 31.25 (CO2 end point, Sobek et al. 1978) or 62.5 (bicarbonate end point). */
  apFactor: z.number(),
  acidPotential: z.number(),
  neutralisationPotential: z.number(),
  netNeutralisationPotential: z.number(),
  /** NP/AP; null when AP = 0. */
  neutralisationPotentialRatio: z.number().nullable(),
  classification: abaClassSchema,
  bands: nprBandsSchema,
  notes: z.array(noteSchema),
});
export type RockAba = z.infer<typeof rockAbaSchema>;

/** AP and NP from the modes of the ABA minerals, through their balanced reactions. */
export const rockMineralAbaSchema = z.object({
  pathway: carbonatePathwaySchema,
  acidPotential: z.number(),
  neutralisationPotential: z.number(),
  /** What an acid digestion would report (iron carbonates counted with Fe2+). */
  apparentNeutralisationPotential: z.number(),
  netNeutralisationPotential: z.number(),
  neutralisationPotentialRatio: z.number().nullable(),
  classification: abaClassSchema,
  minerals: z.array(
    z.object({
      mineral: z.string(),
      formula: z.string(),
      equation: z.string(),
      /** Net mol H+ per mol mineral, exact text. */
      protonsPerMole: z.string(),
      kgCaco3PerTonnePerPercent: z.number(),
      apparentKgCaco3PerTonnePerPercent: z.number().optional(),
      weightPercent: z.number(),
      /** kg CaCO3/t, + acid, − neutralising. */
      contribution: z.number(),
    }),
  ),
  /** Modes left out of the mineralogical ABA (no built-in reaction). */
  ignoredMinerals: z.array(z.string()),
  cautions: z.array(z.string()),
});
export type RockMineralAba = z.infer<typeof rockMineralAbaSchema>;

/** CO2 uptake: theoretical maxima, never verified removals. */
export const rockCo2Schema = z.object({
  /** From modes with a formula: t CO2 per t rock, both end points. */
  fromModes: z
    .object({
      bicarbonate: z.number(),
      carbonate: z.number(),
      minerals: z.array(z.object({ mineral: z.string(), formula: z.string(), weightPercent: z.number(), bicarbonate: z.number(), carbonate: z.number() })),
    })
    .nullable(),
  /** From the oxide analysis (Renforth 2019, Steinour-type): kg CO2 per t rock. */
  fromOxides: z.object({ carbonateKgPerTonne: z.number(), bicarbonateKgPerTonne: z.number() }).nullable(),
  cautions: z.array(z.string()),
});
export type RockCo2 = z.infer<typeof rockCo2Schema>;

/** A rock sample with what the server computes from it; a part is null when its inputs are missing. */
export const rockSampleSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  name: z.string(),
  site: z.string(),
  depthFromM: z.number().nullable(),
  depthToM: z.number().nullable(),
  lithology: z.string(),
  totalSulfurPercent: z.number().nullable(),
  sulfideSulfurPercent: z.number().nullable(),
  sulfateSulfurPercent: z.number().nullable(),
  neutralisationPotential: z.number().nullable(),
  pastePh: z.number().nullable(),
  modes: z.array(z.object({ mineral: z.string(), formula: z.string().nullable(), weightPercent: z.number() })),
  oxides: z.record(z.string(), z.number()).nullable(),
  notes: z.string(),
  /** Null without sulfur or without measured NP. */
  aba: rockAbaSchema.nullable(),
  /** Null without modes of ABA minerals. */
  mineralAba: rockMineralAbaSchema.nullable(),
  co2: rockCo2Schema,
  /** Per-sample flags: `ACID_PASTE_PH` (paste pH < 4, acid-toxic material, Sobek et al. 1978), `INTERVAL_REVERSED`, `SULFUR_FORMS_EXCEED_TOTAL`. */
  flags: z.array(noteSchema),
  version: z.number().int().positive(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type RockSample = z.infer<typeof rockSampleSchema>;

/** Query of `GET /api/teams/:teamId/rock-samples` (viewer+): optional site filter; by site, depth, name. */
export const rockSampleListQuerySchema = z.object({
  site: z.string().max(200).optional(),
});
export type RockSampleListQuery = z.infer<typeof rockSampleListQuerySchema>;

/** Answer of `GET /api/teams/:teamId/rock-samples`. */
export const rockSampleListResponseSchema = z.array(rockSampleSchema);
export type RockSampleListResponse = z.infer<typeof rockSampleListResponseSchema>;

/**
 * The CSV layout of rock samples (wide: one row per sample):
 * `sample,site,depth_from_m,depth_to_m,lithology,total_s_pct,sulfide_s_pct,sulfate_s_pct,np_kg_caco3_t,paste_ph,notes`,
 * then optional `mode:<mineral>` columns in wt% (an ABA mineral name such as
 * `mode:pyrite`, or a formula such as `mode:Mg2SiO4`) and `oxide:<oxide>`
 * columns in wt% (`oxide:CaO`). Empty cell: not measured. Only `sample` is required.
 */
export const ROCK_CSV_FIXED_COLUMNS = [
  'sample',
  'site',
  'depth_from_m',
  'depth_to_m',
  'lithology',
  'total_s_pct',
  'sulfide_s_pct',
  'sulfate_s_pct',
  'np_kg_caco3_t',
  'paste_ph',
  'notes',
] as const;

/** Answer of `POST /api/teams/:teamId/rock-samples/import/preview` (editor+): nothing is saved. */
export const rockSampleCsvPreviewSchema = csvPreviewSchemaOf(createRockSampleRequestSchema);
export type RockSampleCsvPreview = z.infer<typeof rockSampleCsvPreviewSchema>;

/** Answer of `POST /api/teams/:teamId/rock-samples/import` (editor+, 201). */
export const rockSampleCsvImportResponseSchema = csvImportResponseSchemaOf(rockSampleSchema);
export type RockSampleCsvImportResponse = z.infer<typeof rockSampleCsvImportResponseSchema>;
