import { findOxide } from '@tallus/chem';

/** One problem of a pasted analysis, placed by line and column (1-based). */
export interface PasteProblem {
  line: number;
  column: number;
  message: string;
}

/** What a pasted analysis gave: wt% by oxide and every problem found. */
export interface PastedAnalysis {
  oxides: Record<string, number>;
  problems: PasteProblem[];
}

/**
 * Reads oxide weight percents pasted from a spreadsheet or a laboratory certificate, in either
 * layout: a header row of oxide names over one row of values (`SiO2,Al2O3,CaO` / `55.6,28.1,7.7`),
 * or one oxide per line (`SiO2 55.6`, `SiO2;55.6`, tab-separated). Columns such as sample or
 * total are skipped; unknown oxides and values that are no number are reported by place.
 *
 * @param text the pasted text
 * @example readPastedOxides('SiO2\t55.6\nCaO\t7.7').oxides; // { SiO2: 55.6, CaO: 7.7 }
 */
export function readPastedOxides(text: string): PastedAnalysis {
  const lines = text.split(/\r?\n/).map((line) => line.trim()).filter((line) => line.length > 0).map(splitCells);
  if (lines.length === 0) return { oxides: {}, problems: [] };
  const isWide = lines.length >= 2 && lines[0].length > 2 && lines[0].some((cell) => findOxide(cell) !== undefined);
  return isWide ? readWide(lines) : readLong(lines);
}

const SKIPPED = /^(sample|name|id|total|sum|lod|analysis|mineral|point|comment)s?$/i;

function splitCells(line: string): string[] {
  const separator = line.includes('\t') ? '\t' : line.includes(';') ? ';' : line.includes(',') ? ',' : /\s+/;
  return line.split(separator).map((cell) => cell.trim().replace(/^"|"$/g, ''));
}

function readWide(lines: string[][]): PastedAnalysis {
  const [header, values] = lines;
  const result: PastedAnalysis = { oxides: {}, problems: [] };
  header.forEach((name, index) => {
    if (name === '' || SKIPPED.test(name)) return;
    add(result, name, values[index] ?? '', { line: 2, column: index + 1, nameAt: { line: 1, column: index + 1 } });
  });
  if (lines.length > 2) result.problems.push({ line: 3, column: 1, message: 'Only the first analysis is read: paste one analysis at a time.' });
  return result;
}

function readLong(lines: string[][]): PastedAnalysis {
  const result: PastedAnalysis = { oxides: {}, problems: [] };
  lines.forEach((cells, index) => {
    const [name = '', value = ''] = cells;
    if (SKIPPED.test(name) || (index === 0 && /oxide/i.test(name))) return;
    add(result, name, value, { line: index + 1, column: 2, nameAt: { line: index + 1, column: 1 } });
  });
  return result;
}

function add(result: PastedAnalysis, name: string, value: string, place: { line: number; column: number; nameAt: { line: number; column: number } }): void {
  const oxide = findOxide(name);
  if (!oxide) {
    result.problems.push({ ...place.nameAt, message: `“${name}” is no oxide Tallus reads (e.g. SiO2, Al2O3, FeO, FeOT, Fe2O3T, Na2O).` });
    return;
  }
  const normalised = value.replace(',', '.');
  const number = Number(normalised);
  if (normalised === '' || !Number.isFinite(number) || number < 0 || number > 100) {
    result.problems.push({ line: place.line, column: place.column, message: `${oxide.key}: “${value}” is no weight percent from 0 to 100.` });
    return;
  }
  result.oxides[oxide.key] = number;
}
