import { CHEM_ERROR_CODES } from '@tallus/chem';
import { describe, expect, it } from 'vitest';
import { API_ERROR_CODES, ERROR_CODES, errorCodeSchema } from './error-codes';

describe('error codes', () => {
  it('When the lists are merged, then every API and chemistry code is in ERROR_CODES exactly once', () => {
    expect(new Set(ERROR_CODES).size).toBe(ERROR_CODES.length);
    expect(ERROR_CODES.length).toBe(API_ERROR_CODES.length + CHEM_ERROR_CODES.length);
  });

  it.each([...ERROR_CODES])('When %s is a code, then it is SCREAMING_SNAKE and parses', (code) => {
    expect(code).toMatch(/^[A-Z][A-Z0-9]*(_[A-Z0-9]+)*$/);
    expect(errorCodeSchema.parse(code)).toBe(code);
  });

  it('When a code is not in the list, then it does not parse', () => {
    expect(errorCodeSchema.safeParse('TEAM_EXPLODED').success).toBe(false);
  });
});
