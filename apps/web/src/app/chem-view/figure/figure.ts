import { Pipe, PipeTransform } from '@angular/core';

/**
 * Writes a measured figure with a fixed number of decimals and a true minus sign (−), so
 * columns of budgets line up; a missing figure reads "–".
 *
 * @param value the number, or null when unknown
 * @param decimals digits after the decimal point
 * @example formatFigure(-3.59289, 3); // "−3.593"
 */
export function formatFigure(value: number | null | undefined, decimals = 3): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '–';
  return formatterFor(decimals).format(value).replace('-', '−');
}

/** One formatter per decimals count: building an Intl.NumberFormat costs far more than using one. */
const formatters = new Map<number, Intl.NumberFormat>();

function formatterFor(decimals: number): Intl.NumberFormat {
  let formatter = formatters.get(decimals);
  if (!formatter) {
    formatter = new Intl.NumberFormat('en-GB', { minimumFractionDigits: decimals, maximumFractionDigits: decimals });
    formatters.set(decimals, formatter);
  }
  return formatter;
}

/** Template form of {@link formatFigure}: `{{ budget.perKg | figure: 3 }}`. */
@Pipe({ name: 'figure' })
export class FigurePipe implements PipeTransform {
  transform(value: number | null | undefined, decimals = 3): string {
    return formatFigure(value, decimals);
  }
}
