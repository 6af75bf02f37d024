import type { MassBalanceModel, RockSample, TeamSettingsValues, WaterAnalysis } from '@tallus/contracts';
import { abaPlot } from './aba-plot';
import type { PdfContent } from './pdf-document';

const fixed = (value: number | null | undefined, digits = 2): string => (value === null || value === undefined ? '–' : value.toFixed(digits));
const header = (cells: string[]) => cells.map((text) => ({ text, style: 'th' }));
const table = (widths: Array<number | string>, body: unknown[][]): PdfContent => ({ table: { headerRows: 1, widths, body }, layout: 'lightHorizontalLines', style: 'table' });

/** Water analyses with their charge balance under the team's threshold. */
export function waterSection(waters: readonly WaterAnalysis[], settings: TeamSettingsValues): PdfContent[] {
  if (waters.length === 0) return [{ text: 'No water analyses.', style: 'small' }];
  const body = [
    header(['Sample', 'Date', 'pH', 'Solutes (as reported)', 'Σ cations meq/L', 'Σ anions meq/L', 'CBE %', 'Flag', 'Notes']),
    ...waters.map((water) => [
      { text: water.name, bold: true },
      water.sampledOn ?? '–',
      fixed(water.pH),
      Object.entries(water.solutes).map(([key, entry]) => `${key} ${entry.value} ${entry.unit}`).join('; '),
      fixed(water.chargeBalance.cationsMeq, 3),
      fixed(water.chargeBalance.anionsMeq, 3),
      fixed(water.chargeBalance.cbePercent),
      water.chargeBalance.flagged ? `over ±${water.chargeBalance.threshold} %` : 'within',
      water.chargeBalance.notes.map((note) => note.message).join(' '),
    ]),
  ];
  return [{ text: `Charge balance: ${settings.cbeConvention} convention, threshold ±${settings.cbeThresholdPercent} %.`, style: 'small' }, table([60, 44, 24, '*', 40, 40, 30, 40, 150], body)];
}

/** Mass-balance models with their transfers and implied reactions. */
export function massBalanceSection(models: readonly MassBalanceModel[]): PdfContent[] {
  if (models.length === 0) return [{ text: 'No mass-balance models.', style: 'small' }];
  return models.flatMap((model) => [
    { text: `${model.name}: ${model.result.initial.name} → ${model.result.final.name}; constraints ${model.constraints.join(', ')}; status ${model.result.status}`, bold: true, margin: [0, 6, 0, 2] },
    table(
      [30, 30, '*', 200],
      [
        header(['Model', 'Valid', 'Transfers (mmol/kg water; + dissolved, − precipitated)', 'Implied net reaction']),
        ...model.result.models.slice(0, 12).map((solution, index) => [
          String(index + 1),
          solution.valid ? 'yes' : 'no',
          Object.entries(solution.transfers).map(([name, value]) => `${name} ${value} (${solution.transfersDecimal[name]?.toPrecision(4)})`).join('; '),
          { text: solution.impliedReaction.equation ?? '–', style: 'equation' },
        ]),
      ],
    ),
    ...(model.result.models.length > 12 ? [{ text: `${model.result.models.length - 12} further models in the CSV export.`, style: 'small' }] : []),
  ]);
}

/** The ABA table with the classification per sample, and the NP-vs-AP plot. */
export function abaSection(samples: readonly RockSample[], settings: TeamSettingsValues): PdfContent[] {
  const withAba = samples.filter((sample) => sample.aba !== null);
  if (withAba.length === 0) return [{ text: 'No rock samples with sulfur and NP.', style: 'small' }];
  const body = [
    header(['Sample', 'Interval m', 'Lithology', 'S total %', 'S sulfide %', 'AP basis', 'AP', 'NP', 'NNP', 'NPR', 'Class', 'Paste pH', 'Mineral AP / NP']),
    ...withAba.map((sample) => [
      { text: sample.name, bold: true },
      sample.depthFromM === null ? '–' : `${sample.depthFromM}–${sample.depthToM ?? ''}`,
      sample.lithology,
      fixed(sample.totalSulfurPercent),
      fixed(sample.sulfideSulfurPercent),
      sample.aba!.sulfurBasis,
      fixed(sample.aba!.acidPotential, 1),
      fixed(sample.aba!.neutralisationPotential, 1),
      fixed(sample.aba!.netNeutralisationPotential, 1),
      fixed(sample.aba!.neutralisationPotentialRatio),
      sample.aba!.classification,
      fixed(sample.pastePh, 1),
      sample.mineralAba ? `${fixed(sample.mineralAba.acidPotential, 1)} / ${fixed(sample.mineralAba.neutralisationPotential, 1)}` : '–',
    ]),
  ];
  const points = withAba.map((sample) => ({ name: sample.name, acidPotential: sample.aba!.acidPotential, neutralisationPotential: sample.aba!.neutralisationPotential, classification: sample.aba!.classification }));
  const factor = settings.carbonatePathway === 'co2' ? 31.25 : 62.5;
  return [
    { text: `AP = ${factor} × ${settings.apSulfurBasis} S (wt %) in kg CaCO3/t (Sobek et al. 1978${factor === 62.5 ? '; bicarbonate end point after Dold 2017' : ''}); NNP = NP − AP; NPR = NP/AP. Total S is used, with a warning, where sulfide S is missing.`, style: 'small' },
    table([60, 36, 50, 28, 30, 34, 28, 28, 30, 28, 70, 28, '*'], body),
    abaPlot(points, settings.nprBands),
  ];
}

/** CO2 uptake per sample from modes and from oxides, as theoretical maxima. */
export function co2Section(samples: readonly RockSample[]): PdfContent[] {
  const withCo2 = samples.filter((sample) => sample.co2.fromModes !== null || sample.co2.fromOxides !== null);
  if (withCo2.length === 0) return [{ text: 'No rock samples with modes or oxides for CO2 uptake.', style: 'small' }];
  const body = [
    header(['Sample', 'Modes: t CO2/t (bicarbonate)', 'Modes: t CO2/t (carbonate)', 'Oxides: kg CO2/t (bicarbonate)', 'Oxides: kg CO2/t (carbonate)']),
    ...withCo2.map((sample) => [
      { text: sample.name, bold: true },
      fixed(sample.co2.fromModes?.bicarbonate, 4),
      fixed(sample.co2.fromModes?.carbonate, 4),
      fixed(sample.co2.fromOxides?.bicarbonateKgPerTonne, 1),
      fixed(sample.co2.fromOxides?.carbonateKgPerTonne, 1),
    ]),
  ];
  const cautions = [...new Set(withCo2.flatMap((sample) => sample.co2.cautions))];
  return [table(['*', 80, 80, 80, 80], body), { ul: cautions, style: 'small', margin: [0, 4, 0, 0] }];
}
