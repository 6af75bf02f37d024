import { z } from 'zod';
import { rationalTextSchema } from './chem-results';
import { reactionKindSchema } from './reactions';
import { speciesOxidationStatesSchema, speciesPhaseSchema } from './species';

/** Name and version of Tallus's own reaction-set file format. */
export const REACTION_SET_FILE_FORMAT = 'tallus.reaction-set';
export const REACTION_SET_FILE_VERSION = 1;

/** Query of `GET /api/reaction-sets/:id/export` (viewer+). CSV: one row per reaction with its stored results. */
export const exportQuerySchema = z.object({
  format: z.enum(['json', 'csv']).default('json'),
});
export type ExportQuery = z.infer<typeof exportQuerySchema>;

const memberReferenceSchema = z
  .object({
    /** 0-based index into `reactions`. */
    index: z.number().int().nonnegative().optional(),
    /** Or the reaction's name (must be unique in the file). */
    name: z.string().min(1).optional(),
    multiplier: rationalTextSchema.nullable().optional(),
  })
  .refine((member) => (member.index === undefined) !== (member.name === undefined), 'Give either index or name');

/**
 * The Tallus reaction-set file (`format` + `version` 1): what export writes
 * and import reads. Computed results are not in it: the server recomputes them.
 * Importing an export gives the same set.
 */
export const reactionSetFileSchema = z.object({
  format: z.literal(REACTION_SET_FILE_FORMAT),
  version: z.literal(REACTION_SET_FILE_VERSION),
  exportedAt: z.iso.datetime().optional(),
  set: z.object({
    name: z.string().trim().min(1).max(200),
    description: z.string().max(4_000).default(''),
    site: z.string().max(200).default(''),
  }),
  reactions: z
    .array(
      z.object({
        name: z.string().trim().min(1).max(200),
        kind: reactionKindSchema,
        equation: z.string().max(2_000),
        reference: z.string().trim().max(200).nullable().default(null),
        citation: z.string().max(1_000).default(''),
        notes: z.string().max(4_000).default(''),
      }),
    )
    .max(5_000),
  netReactions: z
    .array(
      z.object({
        name: z.string().trim().min(1).max(200),
        reactions: z.array(memberReferenceSchema).min(1).max(50),
        cancel: z.array(z.string().trim().min(1).max(200)).max(50),
      }),
    )
    .max(200)
    .default([]),
  /** Team species the reactions use; created in the importing team when no species with the same formula exists there. */
  species: z
    .array(
      z.object({
        name: z.string().trim().min(1).max(160),
        formula: z.string().trim().min(1).max(200),
        phase: speciesPhaseSchema,
        oxidationStates: speciesOxidationStatesSchema.nullable().default(null),
        notes: z.string().max(4_000).default(''),
        source: z.string().max(500).default(''),
      }),
    )
    .max(1_000)
    .default([]),
});
export type ReactionSetFile = z.infer<typeof reactionSetFileSchema>;
/** The file as written, before defaults. */
export type ReactionSetFileInput = z.input<typeof reactionSetFileSchema>;

/** Multipart field name of `POST /api/teams/:teamId/reaction-sets/import` (editor+): one JSON file, at most 5 MB. Answers 201 with the set detail; 400 IMPORT_INVALID with every issue and its path otherwise. */
export const IMPORT_FILE_FIELD = 'file';
/** Largest import file accepted, in bytes. */
export const IMPORT_MAX_BYTES = 5 * 1024 * 1024;

/** Columns of the CSV export, in order. */
export const EXPORT_CSV_COLUMNS = [
  'position',
  'name',
  'kind',
  'equation',
  'reference',
  'status',
  'balanced_equation',
  'proton_per_mole',
  'proton_mol_per_kg',
  'electrons_transferred',
  'o2_demand',
  'residuals',
  'citation',
  'notes',
] as const;
