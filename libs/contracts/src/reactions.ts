import { z } from 'zod';
import {
  balanceStatusSchema,
  chemIssueSchema,
  chemWarningSchema,
  combineJsonSchema,
  protonBudgetJsonSchema,
  rationalTextSchema,
} from './chem-results';

/** Kinds of reaction (DESIGN.md §2). */
export const REACTION_KINDS = ['dissolution', 'alteration', 'oxidation', 'precipitation', 'gas_exchange', 'half_reaction'] as const;
export const reactionKindSchema = z.enum(REACTION_KINDS);
export type ReactionKind = z.infer<typeof reactionKindSchema>;

/** Id of a reaction or net reaction in a route; anything else answers 404. */
export const reactionIdSchema = z.uuid();

/**
 * The results the server computed with libs/chem when the reaction was last
 * saved, stored and read back as they are.
 *
 * - `mode: 'check'`: some coefficient was written; the reaction was checked as
 *   written, a term without a coefficient counting 1 (`balanced` or `unbalanced`).
 * - `mode: 'balance'`: no coefficient was written; the reaction was balanced
 *   (normalised to 1 mol of the reference species when one is named) and, when
 *   `balanced`, the balanced equation was checked. `open` (several independent
 *   balances: pin coefficients), `impossible` (no balance; `missing`), `invalid`.
 * - `invalid`: the text (or the reference) does not parse; `error.field` says which.
 *
 * Electron budget: electrons given up (+) or taken (−) per element, using the
 * explicit oxidation states of the team's and the built-in catalogue.
 */
export const reactionResultSchema = z.object({
  status: balanceStatusSchema,
  mode: z.enum(['check', 'balance']),
  /** Balanced text in canonical form (`null` when there is none). */
  balancedEquation: z.string().nullable(),
  /** Independent balances (balance mode): 1 determined, >1 open, 0 impossible. */
  freedom: z.number().int().nullable(),
  /** Elements (or `charge`) that cannot balance (`impossible`), or rows off (`unbalanced`). */
  missing: z.array(z.string()),
  /** For `open`: one canonical equation per independent balance. */
  balances: z.array(z.string()),
  /** Left minus right per element and `charge`, exact text; `{}` when not checked. */
  residuals: z.record(z.string(), z.string()),
  electrons: z
    .object({
      byElement: z.record(z.string(), z.string()),
      transferred: z.string(),
      o2Demand: z.string(),
    })
    .nullable(),
  protonBudget: protonBudgetJsonSchema.nullable(),
  warnings: z.array(chemWarningSchema),
  error: chemIssueSchema.extend({ field: z.enum(['equation', 'reference']) }).nullable(),
});
export type ReactionResult = z.infer<typeof reactionResultSchema>;

/** A reaction of a set with its stored results. */
export const reactionSchema = z.object({
  id: z.uuid(),
  setId: z.uuid(),
  /** 0-based place in the set. */
  position: z.number().int().nonnegative(),
  name: z.string(),
  kind: reactionKindSchema,
  equation: z.string(),
  /** Species budgets are normalised to; `null`: the first left-hand species. */
  reference: z.string().nullable(),
  citation: z.string(),
  notes: z.string(),
  result: reactionResultSchema,
  version: z.number().int().positive(),
  updatedAt: z.iso.datetime(),
});
export type Reaction = z.infer<typeof reactionSchema>;

/** Body of `POST /api/reaction-sets/:id/reactions` (editor+). An equation that does not parse is saved with status `invalid`. */
export const createReactionRequestSchema = z.object({
  name: z.string().trim().min(1).max(200),
  kind: reactionKindSchema,
  equation: z.string().max(2_000),
  reference: z.string().trim().max(200).nullable().optional(),
  citation: z.string().max(1_000).optional(),
  notes: z.string().max(4_000).optional(),
  /** 0-based place to insert at; default the end. */
  position: z.number().int().nonnegative().optional(),
});
export type CreateReactionRequest = z.infer<typeof createReactionRequestSchema>;

/** Body of `PATCH /api/reactions/:id` (editor+): changed fields and the version read. */
export const updateReactionRequestSchema = createReactionRequestSchema.omit({ position: true }).partial().extend({
  version: z.number().int().positive(),
});
export type UpdateReactionRequest = z.infer<typeof updateReactionRequestSchema>;

/** Body of `POST /api/reaction-sets/:id/reorder` (editor+): every reaction id of the set exactly once, in the new order. */
export const reorderReactionsRequestSchema = z.object({
  reactionIds: z.array(z.uuid()).max(5_000),
});
export type ReorderReactionsRequest = z.infer<typeof reorderReactionsRequestSchema>;

/** One member of a net reaction: a reaction of the same set and an optional fixed multiplier. */
export const netReactionMemberSchema = z.object({
  reactionId: z.uuid(),
  /** Exact multiplier (`"1/4"`); omitted or null: solved for. Negative reverses the reaction. */
  multiplier: rationalTextSchema.nullable().optional(),
});
export type NetReactionMember = z.infer<typeof netReactionMemberSchema>;

/**
 * The stored result of a net reaction: the engine's combine JSON, plus the
 * check of the net equation (its proton and electron budgets per mole of the
 * first left-hand species) when it combined.
 */
export const netReactionResultSchema = combineJsonSchema.extend({
  protonBudget: protonBudgetJsonSchema.nullable(),
  electrons: reactionResultSchema.shape.electrons,
});
export type NetReactionResult = z.infer<typeof netReactionResultSchema>;

/** A net reaction: reactions of the set times exact multipliers chosen so that `cancel` species cancel. */
export const netReactionSchema = z.object({
  id: z.uuid(),
  setId: z.uuid(),
  name: z.string(),
  reactions: z.array(netReactionMemberSchema.extend({ multiplier: rationalTextSchema.nullable() })),
  /** Formulas of the intermediates that must cancel. */
  cancel: z.array(z.string()),
  result: netReactionResultSchema,
  version: z.number().int().positive(),
  updatedAt: z.iso.datetime(),
});
export type NetReaction = z.infer<typeof netReactionSchema>;

/** Body of `POST /api/reaction-sets/:id/net-reactions` (editor+). Every reaction must belong to the set. */
export const createNetReactionRequestSchema = z.object({
  name: z.string().trim().min(1).max(200),
  reactions: z.array(netReactionMemberSchema).min(1).max(50),
  cancel: z.array(z.string().trim().min(1).max(200)).max(50),
});
export type CreateNetReactionRequest = z.infer<typeof createNetReactionRequestSchema>;

/** Body of `PATCH /api/net-reactions/:id` (editor+). */
export const updateNetReactionRequestSchema = createNetReactionRequestSchema.partial().extend({
  version: z.number().int().positive(),
});
export type UpdateNetReactionRequest = z.infer<typeof updateNetReactionRequestSchema>;
