import type { RockSample as RockSampleView, TeamSettingsValues } from '@tallus/contracts';
import { computeRockFigures, type RockInputs } from './compute-rock-figures';
import type { RockSample } from './rock-sample.entity';

const numberOrNull = (value: unknown): number | null => (value === null || value === undefined ? null : Number(value));

/** The measured inputs of a stored sample, numbers as numbers. */
export function rockInputsOf(row: RockSample): RockInputs {
  return {
    totalSulfurPercent: numberOrNull(row.totalSulfurPercent),
    sulfideSulfurPercent: numberOrNull(row.sulfideSulfurPercent),
    sulfateSulfurPercent: numberOrNull(row.sulfateSulfurPercent),
    neutralisationPotential: numberOrNull(row.neutralisationPotential),
    pastePh: numberOrNull(row.pastePh),
    depthFromM: numberOrNull(row.depthFromM),
    depthToM: numberOrNull(row.depthToM),
    modes: row.modes,
    oxides: row.oxides ?? null,
  };
}

/** A rock sample as responses show it, with ABA and CO2 figures computed now with the team's settings. */
export function toRockView(row: RockSample, settings: TeamSettingsValues): RockSampleView {
  const inputs = rockInputsOf(row);
  return {
    id: row.id,
    teamId: row.team.id,
    name: row.name,
    site: row.site,
    lithology: row.lithology,
    notes: row.notes,
    ...inputs,
    modes: inputs.modes.map((mode) => ({ ...mode })),
    ...computeRockFigures(inputs, settings),
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
