import { Observable, OperatorFunction, debounceTime, distinctUntilChanged, map } from 'rxjs';

import { CheckRequest, CheckView, EMPTY_CHECK, checkReaction } from './check-reaction';

/** Quiet time after the last keystroke before the reaction is checked, in ms. */
export const CHECK_DEBOUNCE_MS = 150;

/**
 * Checks a reaction while the user types: waits for a pause ({@link CHECK_DEBOUNCE_MS}), skips
 * requests equal to the last one, then runs libs/chem in the browser (well under a frame for a
 * 12-species reaction). Nothing goes to the server.
 *
 * @param debounceMs quiet time before a check, in ms
 */
export function liveCheck(debounceMs = CHECK_DEBOUNCE_MS): OperatorFunction<CheckRequest, CheckView> {
  return (requests: Observable<CheckRequest>) =>
    requests.pipe(
      debounceTime(debounceMs),
      distinctUntilChanged(isSameRequest),
      map((request) => (request.equation.trim() === '' ? EMPTY_CHECK : checkReaction(request))),
    );
}

function isSameRequest(a: CheckRequest, b: CheckRequest): boolean {
  return (
    a.equation === b.equation &&
    (a.reference ?? null) === (b.reference ?? null) &&
    (a.rockWeightPercent ?? null) === (b.rockWeightPercent ?? null) &&
    a.oxidationStates === b.oxidationStates
  );
}
