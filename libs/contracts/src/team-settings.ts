import { z } from 'zod';

/**
 * Team settings for site data: the charge-balance threshold of water analyses
 * and the acid-base accounting choices of rock samples. Every team has them;
 * a team that never changed them reads the defaults.
 */

/** `standard`: CBE = (Σcat − Σan)/(Σcat + Σan) × 100; `half-sum`: denominator (Σcat + Σan)/2 (DVWK 128/92). */
export const CBE_CONVENTIONS = ['standard', 'half-sum'] as const;
export const cbeConventionSchema = z.enum(CBE_CONVENTIONS);
export type CbeConvention = z.infer<typeof cbeConventionSchema>;

/** Where carbonate neutralisation ends: `co2` (2 H+ per CaCO3, AP factor 31.25) or `bicarbonate` (1 H+ per CaCO3, 62.5). */
export const CARBONATE_PATHWAYS = ['co2', 'bicarbonate'] as const;
export const carbonatePathwaySchema = z.enum(CARBONATE_PATHWAYS);
export type CarbonatePathwayName = z.infer<typeof carbonatePathwaySchema>;

/** Which sulfur gives AP: `sulfide` (total S with a warning when sulfide S is missing) or always `total` (with the warning). */
export const AP_SULFUR_BASES = ['sulfide', 'total'] as const;
export const apSulfurBasisSchema = z.enum(AP_SULFUR_BASES);
export type ApSulfurBasis = z.infer<typeof apSulfurBasisSchema>;

/** NPR screening bands: NPR < acidGenerating PAG, > nonAcidGenerating non-acid generating, between uncertain. */
export const nprBandsSchema = z
  .object({
    acidGenerating: z.number().positive().max(100),
    nonAcidGenerating: z.number().positive().max(100),
    /** Where the bands come from (guidance, regulation, permit). */
    source: z.string().trim().min(1).max(1_000),
  })
  .refine((bands) => bands.nonAcidGenerating >= bands.acidGenerating, { message: 'nonAcidGenerating must be at least acidGenerating', path: ['nonAcidGenerating'] });
export type NprBandsSetting = z.infer<typeof nprBandsSchema>;

/** The values of the settings. */
export const teamSettingsValuesSchema = z.object({
  /** |CBE| in % above which a water analysis is flagged. */
  cbeThresholdPercent: z.number().positive().max(100),
  cbeConvention: cbeConventionSchema,
  nprBands: nprBandsSchema,
  apSulfurBasis: apSulfurBasisSchema,
  carbonatePathway: carbonatePathwaySchema,
});
export type TeamSettingsValues = z.infer<typeof teamSettingsValuesSchema>;

/** Answer of `GET /api/teams/:teamId/settings` (any member) and of PATCH. */
export const teamSettingsSchema = teamSettingsValuesSchema.extend({
  teamId: z.uuid(),
  /** The defaults with their published sources, for the screen to show beside the values. */
  defaults: teamSettingsValuesSchema.extend({
    cbeThresholdSource: z.string(),
  }),
  /** 0 while the team uses the defaults (never saved); then the optimistic-lock version. */
  version: z.number().int().nonnegative(),
  updatedAt: z.iso.datetime().nullable(),
});
export type TeamSettings = z.infer<typeof teamSettingsSchema>;

/** Body of `PATCH /api/teams/:teamId/settings` (owner): changed values and the version read (0 before the first save; 409 VERSION_CONFLICT when stale). */
export const updateTeamSettingsRequestSchema = teamSettingsValuesSchema.partial().extend({
  version: z.number().int().nonnegative(),
});
export type UpdateTeamSettingsRequest = z.infer<typeof updateTeamSettingsRequestSchema>;
