import type { EntityManager } from '@mikro-orm/postgresql';
import {
  createMassBalanceModelRequestSchema,
  createRockSampleRequestSchema,
  createWaterAnalysisRequestSchema,
  saveMineralFormulaRequestSchema,
  type CreateRockSampleRequest,
  type CreateWaterAnalysisRequest,
} from '@tallus/contracts';
import { MassBalanceModel } from '../../mass-balance/mass-balance-model.entity';
import { createMassBalanceModel } from '../../mass-balance/save-mass-balance-model';
import { MineralFormula } from '../../mineral-formulas/mineral-formula.entity';
import { saveMineralFormula } from '../../mineral-formulas/save-mineral-formula';
import { ReactionSet } from '../../reaction-sets/reaction-set.entity';
import { RockSample } from '../../rock-samples/rock-sample.entity';
import { addRockSamples } from '../../rock-samples/save-rock-sample';
import { Membership } from '../../teams/membership.entity';
import { addWaterAnalyses } from '../../water-analyses/save-water-analysis';
import { WaterAnalysis } from '../../water-analyses/water-analysis.entity';
import { DEMO_SITE_DATA, type DemoSiteData } from './demo-site-data';

async function seedTeam(em: EntityManager, demo: DemoSiteData, teamId: string, actorId: string): Promise<number> {
  let added = 0;
  const missingWaters: CreateWaterAnalysisRequest[] = [];
  for (const water of demo.waters) if ((await em.count(WaterAnalysis, { team: teamId, name: water.name })) === 0) missingWaters.push(createWaterAnalysisRequestSchema.parse(water));
  const missingRocks: CreateRockSampleRequest[] = [];
  for (const rock of demo.rocks) if ((await em.count(RockSample, { team: teamId, name: rock.name })) === 0) missingRocks.push(createRockSampleRequestSchema.parse(rock));
  await em.transactional(async (tx) => {
    added += (await addWaterAnalyses(tx, { teamId, actorId, requests: missingWaters, action: 'water_analysis.created' })).length;
    added += (await addRockSamples(tx, { teamId, actorId, requests: missingRocks, action: 'rock_sample.created' })).length;
  });
  for (const { initialWater, finalWater, ...model } of demo.models) {
    if ((await em.count(MassBalanceModel, { team: teamId, name: model.name })) > 0) continue;
    const waterId = async (name: string) => (await em.findOneOrFail(WaterAnalysis, { team: teamId, name })).id;
    const request = createMassBalanceModelRequestSchema.parse({ ...model, initialWaterId: initialWater === null ? null : await waterId(initialWater), finalWaterId: await waterId(finalWater) });
    await createMassBalanceModel(em, { teamId, actorId, request });
    added++;
  }
  for (const { reactionSet, ...formula } of demo.formulas) {
    if ((await em.count(MineralFormula, { team: teamId, name: formula.name })) > 0) continue;
    const set = reactionSet === null ? null : await em.findOne(ReactionSet, { team: teamId, name: reactionSet });
    await saveMineralFormula(em, { teamId, actorId, request: saveMineralFormulaRequestSchema.parse({ ...formula, reactionSetId: set?.id ?? null }) });
    added++;
  }
  return added;
}

/**
 * Adds the demo site data that is missing (found by name in its team), written
 * by the team's demo editor through the same use cases as the API: water
 * analyses, rock samples, mass-balance models (solved on save) and the
 * microprobe analyses saved as species with their weathering reactions.
 *
 * @returns how many records were added
 */
export async function seedDemoSiteData(em: EntityManager): Promise<number> {
  let added = 0;
  for (const demo of DEMO_SITE_DATA) {
    const editor = await em.findOne(Membership, { team: { name: demo.team }, role: 'editor', user: { email: { $like: 'editor@%.example' } } });
    if (!editor) continue;
    added += await seedTeam(em, demo, editor.team.id, editor.user.id);
  }
  return added;
}
