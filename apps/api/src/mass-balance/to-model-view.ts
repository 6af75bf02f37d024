import type { MassBalanceModel as MassBalanceModelView } from '@tallus/contracts';
import type { MassBalanceModel } from './mass-balance-model.entity';

/** A mass-balance model as responses show it, with its stored result. */
export function toModelView(model: MassBalanceModel): MassBalanceModelView {
  return {
    id: model.id,
    teamId: model.team.id,
    name: model.name,
    description: model.description,
    initialWaterId: model.initialWater?.id ?? null,
    finalWaterId: model.finalWater.id,
    phases: model.phases,
    constraints: model.constraints,
    uncertainty: model.uncertainty,
    result: model.result,
    version: model.version,
    createdAt: model.createdAt.toISOString(),
    updatedAt: model.updatedAt.toISOString(),
  };
}
