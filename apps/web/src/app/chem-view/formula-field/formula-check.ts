import { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import { formulaParts, isChemError, molarMass, parseFormula, type ChemIssue, type FormulaPart } from '@tallus/chem';

/** A formula read in the browser: how it renders and its molar mass, or why it does not read. */
export type FormulaCheck =
  | { isValid: true; parts: FormulaPart[]; molarMass: number; charge: string }
  | { isValid: false; error: ChemIssue }
  | { isValid: false; error: null };

/**
 * Reads a species formula with libs/chem: rendered parts, molar mass in g/mol (IUPAC 2021
 * abridged weights), or the error with its span. Blank text is neither valid nor an error.
 *
 * @param text the formula as typed
 * @example checkFormula('CaCO3'); // { isValid: true, molarMass: 100.086…, … }
 */
export function checkFormula(text: string): FormulaCheck {
  if (text.trim() === '') {
    return { isValid: false, error: null };
  }
  try {
    const formula = parseFormula(text);
    return { isValid: true, parts: formulaParts(formula), molarMass: molarMass(formula), charge: formula.charge.toString() };
  } catch (error) {
    if (!isChemError(error)) throw error;
    return { isValid: false, error: error.toIssue() };
  }
}

/**
 * A form validator for formula fields: the error key `formula` carries the chem issue,
 * so the field can say what is wrong and underline where.
 */
export const formulaValidator: ValidatorFn = (control: AbstractControl): ValidationErrors | null => {
  const result = checkFormula(String(control.value ?? ''));
  return result.isValid || result.error === null ? null : { formula: result.error };
};
