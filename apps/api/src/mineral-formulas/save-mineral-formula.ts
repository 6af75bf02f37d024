import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { Reaction as ReactionView, SaveMineralFormulaRequest, SaveMineralFormulaResponse } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { ConflictError, NotFoundError } from '../errors/app-errors';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { Reaction } from '../reactions/reaction.entity';
import { createReaction } from '../reactions/save-reaction';
import { createSpecies } from '../species/save-species';
import { Species } from '../species/species.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { MineralFormula } from './mineral-formula.entity';
import { basisText, recalculate, RECALCULATION_METHOD } from './recalculate';
import { toMineralFormulaView } from './to-mineral-formula-view';

/** Who saves which analysis in which team. */
export interface SaveMineralFormulaInput {
  teamId: string;
  actorId: string;
  request: SaveMineralFormulaRequest;
}

/**
 * Saves a recalculated formula as a mineral species of the team catalogue with
 * its provenance (analysis, basis, method, date, who), and, when a reaction set
 * is named, adds the formula's weathering reaction to it; one transaction.
 *
 * @throws ChemInputError OXIDES_*; ConflictError SPECIES_DUPLICATE, MINERAL_FORMULA_NO_REACTION, REVIEW_LOCKED;
 *   NotFoundError REACTION_SET_NOT_FOUND when the set is not the team's
 */
export async function saveMineralFormula(em: EntityManager, input: SaveMineralFormulaInput): Promise<SaveMineralFormulaResponse> {
  const { request } = input;
  const result = recalculate(request);
  const basis = basisText(request, result.oxygens);
  return em.transactional(async (tx) => {
    const actor = await tx.findOneOrFail(User, input.actorId);
    const date = new Date().toISOString().slice(0, 10);
    const source = `Recalculated from oxide analysis${request.sampleName ? ` ${request.sampleName}` : ''} on ${basis}; ${actor.displayName}, ${date}`.slice(0, 500);
    const species = await createSpecies(tx, { teamId: input.teamId, actorId: input.actorId, request: { name: request.name, formula: result.formula, phase: 'mineral', notes: request.notes, source } });
    let reaction: ReactionView | null = null;
    if (request.reactionSetId !== null) {
      const set = await tx.findOne(ReactionSet, { id: request.reactionSetId, team: input.teamId });
      if (!set) throw new NotFoundError('REACTION_SET_NOT_FOUND', 'No such reaction set in this team.');
      if (result.weathering.status !== 'balanced' || !result.weathering.equation) {
        throw new ConflictError('MINERAL_FORMULA_NO_REACTION', `The weathering reaction of ${result.formula} does not balance (${result.weathering.status}); save the species without a reaction set.`);
      }
      const written = await createReaction(tx, {
        setId: set.id,
        actorId: input.actorId,
        request: { name: request.reactionName ?? `${request.name} weathering`, kind: 'alteration', equation: result.weathering.equation, reference: result.formula, citation: `Formula from oxide analysis (${basis})`, notes: request.notes },
      });
      reaction = written.reaction ?? null;
    }
    const record = tx.create(MineralFormula, {
      id: randomUUID(),
      team: ref(tx.getReference(Team, input.teamId)),
      species: ref(tx.getReference(Species, species.id)),
      name: request.name,
      sampleName: request.sampleName,
      analysis: request.analysis,
      basis,
      method: RECALCULATION_METHOD,
      result,
      reaction: reaction ? ref(tx.getReference(Reaction, reaction.id)) : null,
      reactionSet: request.reactionSetId ? ref(tx.getReference(ReactionSet, request.reactionSetId)) : null,
      notes: request.notes,
      createdBy: ref(actor),
    });
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: 'mineral_formula.created', entityType: 'mineral_formula', entityId: record.id, summary: `Saved ${request.name} (${result.formula}) from an oxide analysis` });
    await tx.flush();
    return { mineralFormula: toMineralFormulaView(record), species, reaction };
  });
}
