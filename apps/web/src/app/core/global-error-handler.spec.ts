import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatSnackBar } from '@angular/material/snack-bar';

import { GlobalErrorHandler } from './global-error-handler';

describe('GlobalErrorHandler', () => {
  let shown: string[];

  beforeEach(() => {
    shown = [];
    TestBed.configureTestingModule({
      providers: [
        provideZonelessChangeDetection(),
        GlobalErrorHandler,
        { provide: MatSnackBar, useValue: { open: (message: string) => shown.push(message) } },
      ],
    });
    vi.spyOn(console, 'error').mockImplementation(() => undefined);
  });

  afterEach(() => vi.restoreAllMocks());

  it('asks to reload when a lazy chunk of an older version failed to load', () => {
    TestBed.inject(GlobalErrorHandler).handleError(new TypeError('Failed to fetch dynamically imported module: /chunk-ABC.js'));

    expect(shown).toEqual([expect.stringContaining('Tallus was updated. Reload the page')]);
  });

  it('tells what to do about any other unexpected error', () => {
    TestBed.inject(GlobalErrorHandler).handleError(new Error('x is undefined'));

    expect(shown).toEqual([expect.stringContaining('Something went wrong in Tallus')]);
  });
});
