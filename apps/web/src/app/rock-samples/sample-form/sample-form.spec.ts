// Invented samples; the checks are about what the form sends, not chemistry (the server computes ABA).
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import type { RockSample } from '@tallus/contracts';

import { SampleForm, type SampleFormData } from './sample-form';

const stored = {
  id: 's1', teamId: 't1', name: 'KF-WR-01', site: 'Dump', depthFromM: 0, depthToM: 3, lithology: 'andesite',
  totalSulfurPercent: 2.1, sulfideSulfurPercent: 1.95, sulfateSulfurPercent: null, neutralisationPotential: 12, pastePh: 6.1,
  modes: [{ mineral: 'pyrite', formula: null, weightPercent: 3.6 }], oxides: { CaO: 4.2 }, notes: '', version: 4,
} as unknown as RockSample;

describe('SampleForm', () => {
  let closed: RockSample | undefined;

  function open(data: SampleFormData) {
    closed = undefined;
    TestBed.configureTestingModule({
      imports: [SampleForm],
      providers: [
        provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(),
        { provide: MAT_DIALOG_DATA, useValue: data },
        { provide: MatDialogRef, useValue: { close: (value: RockSample) => (closed = value) } },
      ],
    });
    const fixture = TestBed.createComponent(SampleForm);
    fixture.detectChanges();
    return { fixture, http: TestBed.inject(HttpTestingController), element: fixture.nativeElement as HTMLElement };
  }

  const submit = (element: HTMLElement) => element.querySelector('form')!.dispatchEvent(new Event('submit'));
  const type = (element: HTMLElement, label: string, value: string) => {
    const input = element.querySelector<HTMLInputElement>(`input[formcontrolname="${label}"]`)!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
  };

  it('fills in a stored sample and saves its changes with the version it was read at, modes and oxides included', () => {
    const { element, http } = open({ teamId: 't1', sample: stored });
    expect(element.querySelector<HTMLInputElement>('input[formcontrolname="sulfideSulfurPercent"]')!.value).toBe('1.95');

    type(element, 'sulfideSulfurPercent', '0.8');
    submit(element);

    const request = http.expectOne('/api/rock-samples/s1');
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toMatchObject({ version: 4, sulfideSulfurPercent: 0.8, modes: [{ mineral: 'pyrite', formula: null, weightPercent: 3.6 }], oxides: { CaO: 4.2 } });
    request.flush({ ...stored, sulfideSulfurPercent: 0.8, version: 5 });
    expect(closed?.version).toBe(5);
    http.verify();
  });

  it('sends nothing while the name is missing or the interval ends above its start, then adds the sample', () => {
    const { element, http, fixture } = open({ teamId: 't1' });
    submit(element);
    type(element, 'name', 'JR-1');
    type(element, 'depthFromM', '5');
    type(element, 'depthToM', '2');
    submit(element);
    fixture.detectChanges();
    http.expectNone('/api/teams/t1/rock-samples');
    expect(element.textContent).toContain('The interval ends above where it starts');

    type(element, 'depthToM', '8');
    submit(element);
    const request = http.expectOne('/api/teams/t1/rock-samples');
    expect(request.request.body).toMatchObject({ name: 'JR-1', depthFromM: 5, depthToM: 8, modes: [], oxides: null });
    http.verify();
  });
});
