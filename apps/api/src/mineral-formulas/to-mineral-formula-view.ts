import type { MineralFormula as MineralFormulaView } from '@tallus/contracts';
import { toActor } from '../users/to-actor';
import type { MineralFormula } from './mineral-formula.entity';

/** A saved recalculation as responses show it (`createdBy` must be loaded). */
export function toMineralFormulaView(record: MineralFormula): MineralFormulaView {
  return {
    id: record.id,
    teamId: record.team.id,
    speciesId: record.species?.id ?? null,
    name: record.name,
    sampleName: record.sampleName,
    analysis: record.analysis,
    basis: record.basis,
    method: record.method,
    result: record.result,
    reactionId: record.reaction?.id ?? null,
    reactionSetId: record.reactionSet?.id ?? null,
    notes: record.notes,
    createdBy: toActor(record.createdBy),
    createdAt: record.createdAt.toISOString(),
  };
}
