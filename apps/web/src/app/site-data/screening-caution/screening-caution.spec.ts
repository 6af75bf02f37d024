import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { CO2_CAUTIONS } from '@tallus/chem';

import { ScreeningCaution } from './screening-caution';

describe('ScreeningCaution', () => {
  it('says it is a screening estimate, defers to professionals and lists the engine’s cautions', () => {
    TestBed.configureTestingModule({ imports: [ScreeningCaution], providers: [provideZonelessChangeDetection()] });
    const fixture = TestBed.createComponent(ScreeningCaution);
    fixture.componentRef.setInput('title', 'CO₂ uptake potential.');
    fixture.componentRef.setInput('notes', [CO2_CAUTIONS.THEORETICAL]);
    fixture.detectChanges();
    const element = fixture.nativeElement as HTMLElement;
    expect(element.getAttribute('role')).toBe('note');
    expect(element.textContent).toContain('not a substitute for kinetic testing, site investigation, local regulation or a licensed professional');
    expect(element.querySelector('li')?.textContent).toContain('not a verified removal');
  });
});
