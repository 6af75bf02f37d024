import { ValidationErrors } from '@angular/forms';
import type { Problem, ProblemIssue } from '@tallus/contracts';

import { toProblem } from './problem';

/**
 * Screen texts for error codes, in one place. Problems from the API bring their own
 * English `detail`; these texts replace it where the screen can say more about what to do.
 * NETWORK and UNKNOWN have no entry: `toProblem` and the global error handler give those
 * problems a detail that says more than one fixed text could (a failed lazy chunk, a 5xx).
 */
const messagesByCode: Readonly<Record<string, string>> = {
  AUTH_INVALID_CREDENTIALS: 'E-mail or password is wrong.',
  AUTH_RATE_LIMITED: 'Too many attempts. Wait a few minutes, then try again.',
  AUTH_EMAIL_TAKEN: 'An account with this e-mail exists already. Sign in instead.',
  TEAM_LAST_OWNER: 'A team needs at least one owner. Make another member owner first.',
  TEAM_ROLE_REQUIRED: 'Your role in this team does not allow this. Ask one of the team’s owners.',
  INVITATION_NOT_FOUND: 'This invitation does not exist. Ask the team’s owner to send a new one.',
  INVITATION_USED: 'This invitation was accepted already. Open the team from the team switcher.',
  INVITATION_EXPIRED: 'This invitation has expired. Ask the team’s owner to send a new one.',
  INVITATION_WRONG_USER:
    'This invitation was sent to another e-mail address. Sign in with that address to accept it.',
  INVITATION_ALREADY_MEMBER: 'This person is a member of the team already.',
  WATER_ANALYSIS_DUPLICATE: 'The team has a water analysis of this sample name already. Give the sample another name, or open the existing one.',
  WATER_ANALYSIS_IN_USE: 'Mass-balance models use this water analysis. Change or delete those models first.',
  ROCK_SAMPLE_DUPLICATE: 'The team has a rock sample of this name already. Give the sample another name.',
  MASS_BALANCE_UNKNOWN_WATER: 'The chosen water analysis no longer exists in this team. Choose another water.',
  MASS_BALANCE_UNKNOWN_SPECIES: 'A candidate phase names a species that is not in the catalogue any more. Choose another species.',
  MINERAL_FORMULA_NO_REACTION: 'The weathering reaction of this formula does not balance, so it cannot be added to a reaction set. Save the species alone, or change the products.',
};

/**
 * What to do about a chemistry problem, added after libs/chem's own message (which already
 * names the culprit, e.g. the unknown element). Serves the instant checks in the browser and
 * the API's 422 problems alike.
 */
const chemHintsByCode: Readonly<Record<string, string>> = {
  FORMULA_UNKNOWN_ELEMENT: 'Element symbols start with a capital letter: Co is cobalt, CO is carbon monoxide.',
  FORMULA_MIXED_SITE: 'Give the proportions of the site, e.g. (Mg0.9,Fe0.1)2SiO4.',
  FORMULA_AMBIGUOUS_CHARGE: 'Write the charge with a caret: Ca^2+ or Ca²⁺.',
  FORMULA_UNBALANCED_PAREN: 'Close every bracket you open.',
  EQUATION_NO_ARROW: 'Example: CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O',
  EQUATION_EMPTY_TERM: "Put a space on each side of a '+' between species; a charge is written ^+ or at the formula's end.",
  BUDGET_UNKNOWN_REFERENCE: 'Choose the reference species among the species of the reaction.',
  BALANCE_UNKNOWN_SPECIES: 'Only species of the reaction can be pinned or normalised to.',
};

/** Texts for the client-side validators of reactive forms, keyed by validator error key. */
const messagesByValidator: Readonly<Record<string, (details: unknown) => string>> = {
  required: () => 'Required.',
  email: () => 'Enter an e-mail address such as name@example.org.',
  minlength: (details) => `Use at least ${requiredLength(details)} characters.`,
  maxlength: (details) => `Use at most ${requiredLength(details)} characters.`,
  whitespace: () => 'Must contain more than spaces.',
  min: (details) => `Give ${boundOf(details, 'min')} or more.`,
  max: (details) => `Give ${boundOf(details, 'max')} or less.`,
};

/** The limit of a `min` or `max` validator's error details. */
function boundOf(details: unknown, key: 'min' | 'max'): string {
  return typeof details === 'object' && details !== null && key in details ? String((details as Record<string, unknown>)[key]) : 'a value in range';
}

/**
 * The text to show for a whole problem (snackbar or form banner): the code's own
 * text where one exists, otherwise the API's detail.
 *
 * @param problem the parsed problem body
 */
export function describeProblem(problem: Problem): string {
  return messagesByCode[problem.code] ?? (problem.detail || problem.title);
}

/**
 * The text for whatever a failed call threw, e.g. a resource's `error()`; null when nothing failed.
 *
 * @param error the error, or undefined/null when there is none
 */
export function errorText(error: unknown): string | null {
  return error ? describeProblem(toProblem(error)) : null;
}

/**
 * The text to show for one field issue from the API.
 *
 * @param issue one entry of `problem.issues`
 */
export function describeIssue(issue: ProblemIssue): string {
  return messagesByCode[issue.code] ?? issue.message;
}

/**
 * The text for a chemistry problem found in the browser or reported by the API:
 * libs/chem's message, then what to do about it where that helps.
 *
 * @param issue a code and message, as `ChemError.toIssue()` or a problem issue gives them
 */
export function describeChemIssue(issue: { code: string; message: string }): string {
  const hint = chemHintsByCode[issue.code];
  return hint ? `${issue.message} ${hint}` : issue.message;
}

/**
 * The text of the first error of a form control, for its `mat-error`.
 * A `server` error carries the API's text as is.
 *
 * @param errors `control.errors`
 */
export function describeValidationErrors(errors: ValidationErrors | null): string {
  if (!errors) {
    return '';
  }
  const [key, details] = Object.entries(errors)[0] ?? [];
  if (key === undefined) {
    return '';
  }
  if (key === 'server' && typeof details === 'string') {
    return details;
  }
  return messagesByValidator[key]?.(details) ?? 'Check this value.';
}

function requiredLength(details: unknown): number | string {
  if (typeof details === 'object' && details !== null && 'requiredLength' in details) {
    return String(details.requiredLength);
  }
  return '';
}
