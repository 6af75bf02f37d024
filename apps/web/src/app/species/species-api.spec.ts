import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { Species } from '@tallus/contracts';

import { SpeciesApi } from './species-api';

describe('SpeciesApi.listBuiltin', () => {
  let api: SpeciesApi;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting()],
    });
    api = TestBed.inject(SpeciesApi);
    http = TestBed.inject(HttpTestingController);
  });

  afterEach(() => http.verify());

  it('fetches the built-in catalogue once and shares it with later callers', () => {
    const builtin = [{ formula: 'CaCO3' }] as Species[];
    const first: Species[][] = [];
    const second: Species[][] = [];

    api.listBuiltin().subscribe((species) => first.push(species));
    http.expectOne('/api/species/builtin').flush(builtin);
    api.listBuiltin().subscribe((species) => second.push(species));

    http.expectNone('/api/species/builtin');
    expect(first).toEqual([builtin]);
    expect(second).toEqual([builtin]);
  });

  it('tries again after a failed fetch instead of replaying the error', () => {
    const errors: unknown[] = [];
    const loaded: Species[][] = [];

    api.listBuiltin().subscribe({ error: (error: unknown) => errors.push(error) });
    http.expectOne('/api/species/builtin').flush(null, { status: 503, statusText: 'Unavailable' });
    api.listBuiltin().subscribe((species) => loaded.push(species));
    http.expectOne('/api/species/builtin').flush([]);

    expect(errors).toHaveLength(1);
    expect(loaded).toEqual([[]]);
  });
});
