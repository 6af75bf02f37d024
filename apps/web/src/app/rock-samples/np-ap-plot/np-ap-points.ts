import type { RockSample } from '@tallus/contracts';

/** One sample on the NP-vs-AP plot, kg CaCO3/t. */
export interface NpApPoint {
  name: string;
  ap: number;
  np: number;
  classification: string;
  /** Whether AP came from total sulfur (a warning on the point). */
  isTotalSulfur: boolean;
}

/** A band line NP = ratio × AP from `from` to `to` (kg CaCO3/t of AP). */
export interface BandLine {
  ratio: number;
  label: string;
  points: { x: number; y: number }[];
}

/** Smallest value plotted on logarithmic axes; zeros and smaller values sit on it. */
export const LOG_FLOOR = 0.1;

/**
 * The samples with an ABA result as points.
 *
 * @param samples the team's rock samples
 */
export function npApPoints(samples: readonly RockSample[]): NpApPoint[] {
  return samples.flatMap((sample) =>
    sample.aba
      ? [{ name: sample.name, ap: sample.aba.acidPotential, np: sample.aba.neutralisationPotential, classification: sample.aba.classification, isTotalSulfur: sample.aba.sulfurBasis === 'total' }]
      : [],
  );
}

/**
 * The NPR band lines across the plotted range, e.g. NPR = 1 and NPR = 3.
 *
 * @param bands the team's bands
 * @param points the points (for the range)
 * @param isLog whether the axes are logarithmic (then the lines start at the floor)
 */
export function bandLines(bands: { acidGenerating: number; nonAcidGenerating: number }, points: readonly NpApPoint[], isLog: boolean): BandLine[] {
  const largest = Math.max(10, ...points.map((point) => Math.max(point.ap, point.np)));
  const to = niceCeiling(largest * 1.2);
  const from = isLog ? LOG_FLOOR : 0;
  const ratios = [...new Set([bands.acidGenerating, bands.nonAcidGenerating])];
  return ratios.map((ratio) => ({
    ratio,
    label: `NPR = ${ratio}`,
    points: [
      { x: from, y: from * ratio },
      { x: to, y: to * ratio },
    ],
  }));
}

/**
 * A value shown on a logarithmic axis: values below the floor sit on it.
 *
 * @param value kg CaCO3/t
 */
export function onLogAxis(value: number): number {
  return Math.max(LOG_FLOOR, value);
}

function niceCeiling(value: number): number {
  const power = 10 ** Math.floor(Math.log10(value));
  return Math.ceil(value / power) * power;
}
