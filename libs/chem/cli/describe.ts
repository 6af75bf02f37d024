/**
 * Short human-readable summaries of results, for the command line without `--json`.
 */
import type { BalanceResult, CheckResult, CombineResult, MassJson } from '../src/index';

/** One or a few lines describing a balance. */
export function describeBalance(result: BalanceResult): string {
  const lines = [`${result.status}${result.equation === null ? '' : `: ${result.equation}`}`];
  if (result.status === 'open') lines.push(`${result.freedom} independent balances; pin coefficients with --pin:`, ...(result.balances ?? []).map((text) => `  ${text}`));
  if (result.missing !== undefined && result.missing.length > 0) lines.push(`cannot balance: ${result.missing.join(', ')}`);
  if (result.error !== undefined) lines.push(`${result.error.code} at ${result.error.span.start}–${result.error.span.end}: ${result.error.message}`);
  for (const warning of result.warnings) lines.push(`warning: ${warning.message}`);
  return lines.join('\n');
}

/** One or a few lines describing a check. */
export function describeCheck(result: CheckResult): string {
  if (result.error !== undefined) return `invalid: ${result.error.code}: ${result.error.message}`;
  const off = [...result.residuals].filter(([, value]) => !value.isZero());
  const lines = [off.length === 0 ? 'balanced' : `unbalanced: ${off.map(([label, value]) => `${label} ${value.toString()}`).join(', ')} (left − right)`];
  if (result.electrons !== null) {
    const moved = [...result.electrons.byElement].map(([symbol, value]) => `${symbol} ${value.toString()}`).join(', ');
    lines.push(`electrons given up (+) / taken (−): ${moved || 'none'}; O2 demand ${result.electrons.o2Demand.toString()} mol`);
  }
  if (result.protonBudget !== null) lines.push(`proton budget: ${result.protonBudget.perMole.toString()} mol H+ per mol ${result.protonBudget.reference}`);
  for (const warning of result.warnings) lines.push(`warning: ${warning.message}`);
  return lines.join('\n');
}

/** One line describing a molar mass. */
export function describeMass(json: MassJson): string {
  return `${json.formula}: ${json.molarMass.toFixed(3)} g/mol`;
}

/** One or two lines describing a net reaction. */
export function describeCombine(result: CombineResult): string {
  if (result.error !== undefined) return `invalid: ${result.error.code}: ${result.error.message}`;
  const multipliers = result.multipliers.map((value) => value?.toString() ?? '?').join(', ');
  return `${result.status}: ${result.equation ?? ''}\nmultipliers: ${multipliers}`;
}
