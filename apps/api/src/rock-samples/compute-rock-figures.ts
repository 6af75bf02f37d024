import {
  ABA_MINERALS,
  AP_FACTOR,
  AP_FACTOR_BICARBONATE,
  acidBaseAccounting,
  ChemError,
  classifyNpr,
  findOxide,
  isChemError,
  mineralAcidBase,
  mineralCo2Uptake,
  mineralFactor,
  oxideCo2Potential,
  parseFormula,
} from '@tallus/chem';
import type { MineralMode, RockAba, RockCo2, RockMineralAba, TeamSettingsValues } from '@tallus/contracts';
import { withChemPath } from '../site-data/chem-path';

/** The measured fields of a sample the figures come from. */
export interface RockInputs {
  totalSulfurPercent: number | null;
  sulfideSulfurPercent: number | null;
  sulfateSulfurPercent: number | null;
  neutralisationPotential: number | null;
  pastePh: number | null;
  depthFromM: number | null;
  depthToM: number | null;
  modes: readonly MineralMode[];
  oxides: Readonly<Record<string, number>> | null;
}

/** Everything computed for one sample. */
export interface RockFigures {
  aba: RockAba | null;
  mineralAba: RockMineralAba | null;
  co2: RockCo2;
  flags: Array<{ code: string; message: string }>;
}

const isAbaMineral = (name: string): boolean => (ABA_MINERALS as readonly string[]).includes(name.toLowerCase());

/** The formula of a mode for CO2 uptake: given, of an ABA mineral, or the name when it parses as a formula. */
export function modeFormula(mode: MineralMode): string | null {
  if (mode.formula) return mode.formula;
  if (isAbaMineral(mode.mineral)) return mineralFactor(mode.mineral.toLowerCase()).formula;
  try {
    parseFormula(mode.mineral);
    return mode.mineral;
  } catch (error) {
    if (isChemError(error)) return null;
    throw error;
  }
}

function sulfurAba(inputs: RockInputs, settings: TeamSettingsValues): RockAba | null {
  const { sulfideSulfurPercent: sulfide, totalSulfurPercent: total, neutralisationPotential: np } = inputs;
  if (np === null || (sulfide === null && total === null)) return null;
  const useTotal = total !== null && (settings.apSulfurBasis === 'total' || sulfide === null);
  const apFactor = settings.carbonatePathway === 'co2' ? AP_FACTOR : AP_FACTOR_BICARBONATE;
  const { acidGenerating, nonAcidGenerating, source } = settings.nprBands;
  const result = acidBaseAccounting({
    ...(useTotal ? { totalSulfurPercent: total } : { sulfideSulfurPercent: sulfide ?? 0 }),
    neutralisationPotential: np,
    apFactor,
    bands: { acidGenerating, nonAcidGenerating, source },
  });
  return { ...result, sulfurBasis: useTotal ? 'total' : 'sulfide', apFactor, bands: { ...result.bands }, notes: result.notes.map((note) => ({ ...note })) };
}

function mineralogicalAba(modes: readonly MineralMode[], settings: TeamSettingsValues): RockMineralAba | null {
  const aba = modes.filter((mode) => isAbaMineral(mode.mineral));
  if (aba.length === 0) return null;
  const percents: Record<string, number> = {};
  for (const mode of aba) percents[mode.mineral.toLowerCase()] = (percents[mode.mineral.toLowerCase()] ?? 0) + mode.weightPercent;
  const result = mineralAcidBase(percents, { pathway: settings.carbonatePathway });
  return {
    pathway: settings.carbonatePathway,
    acidPotential: result.acidPotential,
    neutralisationPotential: result.neutralisationPotential,
    apparentNeutralisationPotential: result.apparentNeutralisationPotential,
    netNeutralisationPotential: result.netNeutralisationPotential,
    neutralisationPotentialRatio: result.neutralisationPotentialRatio,
    classification: classifyNpr(result.neutralisationPotentialRatio, settings.nprBands),
    minerals: result.minerals.map((entry) => ({
      mineral: entry.mineral,
      formula: entry.formula,
      equation: entry.equation,
      protonsPerMole: entry.protonsPerMole.toString(),
      kgCaco3PerTonnePerPercent: entry.kgCaco3PerTonnePerPercent,
      ...(entry.apparentKgCaco3PerTonnePerPercent === undefined ? {} : { apparentKgCaco3PerTonnePerPercent: entry.apparentKgCaco3PerTonnePerPercent }),
      weightPercent: entry.weightPercent,
      contribution: entry.contribution,
    })),
    ignoredMinerals: modes.filter((mode) => !isAbaMineral(mode.mineral)).map((mode) => mode.mineral),
    cautions: [...result.cautions],
  };
}

function co2Figures(modes: readonly MineralMode[], oxides: Readonly<Record<string, number>> | null): RockCo2 {
  const cautions = new Set<string>();
  const minerals = modes.flatMap((mode) => {
    const formula = modeFormula(mode);
    if (formula === null) return [];
    const uptake = mineralCo2Uptake(formula);
    uptake.cautions.forEach((caution) => cautions.add(caution));
    return [{ mineral: mode.mineral, formula, weightPercent: mode.weightPercent, bicarbonate: uptake.bicarbonate, carbonate: uptake.carbonate }];
  });
  const fromModes =
    minerals.length === 0
      ? null
      : {
          bicarbonate: minerals.reduce((sum, entry) => sum + (entry.bicarbonate * entry.weightPercent) / 100, 0),
          carbonate: minerals.reduce((sum, entry) => sum + (entry.carbonate * entry.weightPercent) / 100, 0),
          minerals,
        };
  let fromOxides: RockCo2['fromOxides'] = null;
  if (oxides && ['CaO', 'MgO', 'Na2O', 'K2O'].some((key) => (oxides[key] ?? 0) > 0)) {
    const potential = oxideCo2Potential(oxides);
    potential.cautions.forEach((caution) => cautions.add(caution));
    fromOxides = { carbonateKgPerTonne: potential.carbonateKgPerTonne, bicarbonateKgPerTonne: potential.bicarbonateKgPerTonne };
  }
  return { fromModes, fromOxides, cautions: [...cautions] };
}

function flagsOf(inputs: RockInputs): RockFigures['flags'] {
  const flags: RockFigures['flags'] = [];
  if (inputs.pastePh !== null && inputs.pastePh < 4) flags.push({ code: 'ACID_PASTE_PH', message: 'Paste pH below 4: acid-toxic material (Sobek et al. 1978); the sample is already producing acid.' });
  if (inputs.depthFromM !== null && inputs.depthToM !== null && inputs.depthToM < inputs.depthFromM) flags.push({ code: 'INTERVAL_REVERSED', message: 'The interval ends above where it starts.' });
  const { totalSulfurPercent: total, sulfideSulfurPercent: sulfide, sulfateSulfurPercent: sulfate } = inputs;
  if (total !== null && (sulfide ?? 0) + (sulfate ?? 0) > total * 1.05 + 0.01) flags.push({ code: 'SULFUR_FORMS_EXCEED_TOTAL', message: 'Sulfide plus sulfate sulfur exceed total sulfur by more than 5 %: check the analyses.' });
  return flags;
}

/**
 * ABA from sulfur and measured NP (AP factor by the team's carbonate pathway,
 * bands of the team), mineralogical ABA from modes, CO2 uptake from modes and
 * oxides, and per-sample flags, all through libs/chem.
 *
 * @throws ChemInputError at `modes.<i>.formula`, `oxides.<key>` or the ABA field the engine names
 */
export function computeRockFigures(inputs: RockInputs, settings: TeamSettingsValues): RockFigures {
  inputs.modes.forEach((mode, index) => withChemPath(['modes', index, 'formula'], () => mode.formula && mineralCo2Uptake(mode.formula)));
  for (const key of Object.keys(inputs.oxides ?? {})) {
    if (findOxide(key)) continue;
    withChemPath([], () => {
      throw new ChemError('OXIDES_UNKNOWN_OXIDE', `Unknown oxide "${key}".`, { start: 0, end: key.length }, { field: `oxides.${key}` });
    });
  }
  return withChemPath([], () => ({
    aba: sulfurAba(inputs, settings),
    mineralAba: mineralogicalAba(inputs.modes, settings),
    co2: co2Figures(inputs.modes, inputs.oxides),
    flags: flagsOf(inputs),
  }));
}
