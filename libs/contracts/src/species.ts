import { z } from 'zod';
import { rationalTextSchema } from './chem-results';

/** Phase of a species (DESIGN.md §2). */
export const SPECIES_PHASES = ['mineral', 'aqueous', 'gas', 'liquid'] as const;
export const speciesPhaseSchema = z.enum(SPECIES_PHASES);
export type SpeciesPhase = z.infer<typeof speciesPhaseSchema>;

/** Explicit oxidation states of one species by element, exact text: `{"Fe": "2", "S": "-1"}`, `{"Fe": "8/3"}`. */
export const speciesOxidationStatesSchema = z.record(z.string().regex(/^[A-Z][a-z]?$/, 'An element symbol such as Fe'), rationalTextSchema);
export type SpeciesOxidationStates = z.infer<typeof speciesOxidationStatesSchema>;

/** Id of a team species in a route (`/api/species/:id`); anything else answers 404. */
export const speciesIdSchema = z.uuid();

/** Body of `POST /api/teams/:teamId/species` (editor+). The formula must parse (422 at path `formula` with its span). */
export const createSpeciesRequestSchema = z.object({
  name: z.string().trim().min(1).max(160),
  formula: z.string().trim().min(1).max(200),
  phase: speciesPhaseSchema,
  oxidationStates: speciesOxidationStatesSchema.nullable().optional(),
  notes: z.string().max(4_000).optional(),
  /** Where the formula comes from: a publication, an analysis, "invented" for demo data. */
  source: z.string().max(500).optional(),
});
export type CreateSpeciesRequest = z.infer<typeof createSpeciesRequestSchema>;

/** Body of `PATCH /api/species/:id` (editor+): any fields, and the version read (409 VERSION_CONFLICT when stale). */
export const updateSpeciesRequestSchema = createSpeciesRequestSchema.partial().extend({
  version: z.number().int().positive(),
});
export type UpdateSpeciesRequest = z.infer<typeof updateSpeciesRequestSchema>;

/**
 * A species of a team's catalogue or of the built-in starter catalogue. Molar
 * mass (g/mol, IUPAC 2021 abridged weights), composition and charge are
 * computed by the server from the formula, never typed.
 */
export const speciesSchema = z.object({
  /** A UUID for team species; `builtin:<key>` for the starter catalogue. */
  id: z.string(),
  /** Owning team; `null` for the built-in catalogue. */
  teamId: z.uuid().nullable(),
  isBuiltin: z.boolean(),
  name: z.string(),
  formula: z.string(),
  phase: speciesPhaseSchema,
  oxidationStates: speciesOxidationStatesSchema.nullable(),
  notes: z.string(),
  source: z.string(),
  molarMass: z.number(),
  /** Exact atoms per formula unit, e.g. `{"Na": "31/50", ...}`. */
  composition: z.record(z.string(), z.string()),
  charge: z.string(),
  /** Optimistic-lock version; 0 for built-in species. */
  version: z.number().int(),
  createdAt: z.iso.datetime().nullable(),
  updatedAt: z.iso.datetime().nullable(),
});
export type Species = z.infer<typeof speciesSchema>;

/** Answer of `GET /api/teams/:teamId/species` (the team's own, by name) and of `GET /api/species/builtin` (catalogue order). */
export const speciesListResponseSchema = z.array(speciesSchema);
export type SpeciesListResponse = z.infer<typeof speciesListResponseSchema>;
