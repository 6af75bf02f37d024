import type { AbaClassName, NprBandsSetting } from '@tallus/contracts';
import type { PdfContent } from './pdf-document';

/** One sample on the plot. */
export interface AbaPoint {
  name: string;
  acidPotential: number;
  neutralisationPotential: number;
  classification: AbaClassName;
}

/** Class colours: clay red, ochre, sage (DESIGN.md §7). */
export const CLASS_COLOURS: Record<AbaClassName, string> = {
  'potentially-acid-generating': '#a8472f',
  uncertain: '#b07d1f',
  'non-acid-generating': '#5f8a66',
};

const SIZE = 260;

/**
 * NP against AP (kg CaCO3/t, same scale on both axes) with the NPR band lines
 * NP = k × AP through the origin, drawn as pdfmake canvas vectors, with its
 * scale and legend as text.
 */
export function abaPlot(points: readonly AbaPoint[], bands: NprBandsSetting): PdfContent {
  const max = Math.max(10, ...points.map((point) => Math.max(point.acidPotential, point.neutralisationPotential))) * 1.1;
  const scale = (value: number) => (value / max) * SIZE;
  const line = (k: number, dash: boolean) => {
    const end = Math.min(max, max / k);
    return { type: 'line', x1: 0, y1: SIZE, x2: scale(end), y2: SIZE - scale(end * k), lineWidth: 1, lineColor: '#55606b', ...(dash ? { dash: { length: 4 } } : {}) };
  };
  const ticks = [0.25, 0.5, 0.75, 1].flatMap((fraction) => [
    { type: 'line', x1: fraction * SIZE, y1: SIZE, x2: fraction * SIZE, y2: SIZE + 4, lineWidth: 0.5, lineColor: '#2f3a45' },
    { type: 'line', x1: -4, y1: SIZE - fraction * SIZE, x2: 0, y2: SIZE - fraction * SIZE, lineWidth: 0.5, lineColor: '#2f3a45' },
  ]);
  const canvas = [
    { type: 'rect', x: 0, y: 0, w: SIZE, h: SIZE, lineColor: '#2f3a45', lineWidth: 0.8 },
    ...ticks,
    line(bands.acidGenerating, false),
    line(bands.nonAcidGenerating, true),
    ...points.map((point) => ({ type: 'ellipse', x: scale(point.acidPotential), y: SIZE - scale(point.neutralisationPotential), r1: 3, r2: 3, color: CLASS_COLOURS[point.classification] })),
  ];
  const tick = (fraction: number) => (max * fraction).toFixed(0);
  return {
    stack: [
      { text: 'NP against AP (kg CaCO3/t)', style: 'caption' },
      { canvas, margin: [12, 6, 0, 4] },
      { text: `Both axes 0 to ${max.toFixed(0)} kg CaCO3/t; ticks at ${tick(0.25)}, ${tick(0.5)}, ${tick(0.75)}, ${tick(1)}. Horizontal: AP; vertical: NP.`, style: 'small' },
      { text: `Solid line NPR = ${bands.acidGenerating} (below: potentially acid generating); dashed line NPR = ${bands.nonAcidGenerating} (above: non-acid generating). Bands: ${bands.source}`, style: 'small' },
      {
        text: [
          { text: '● potentially acid generating   ', color: CLASS_COLOURS['potentially-acid-generating'] },
          { text: '● uncertain   ', color: CLASS_COLOURS.uncertain },
          { text: '● non-acid generating', color: CLASS_COLOURS['non-acid-generating'] },
        ],
        style: 'small',
      },
    ],
  };
}
