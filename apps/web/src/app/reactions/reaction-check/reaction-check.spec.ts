import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import { checkReaction } from './check-reaction';
import { ReactionCheck } from './reaction-check';

describe('ReactionCheck', () => {
  function render(equation: string, rockWeightPercent: number | null = 1): HTMLElement {
    TestBed.configureTestingModule({ imports: [ReactionCheck], providers: [provideZonelessChangeDetection()] });
    const fixture = TestBed.createComponent(ReactionCheck);
    fixture.componentRef.setInput('check', checkReaction({ equation, rockWeightPercent }));
    fixture.componentRef.setInput('equation', equation);
    fixture.componentRef.setInput('rockWeightPercent', rockWeightPercent);
    fixture.detectChanges();
    return fixture.nativeElement as HTMLElement;
  }

  it('shows "unbalanced" as icon and word, and marks the rows that do not balance', () => {
    const element = render('KAlSi3O8 + 2 H+ + H2O -> Al2Si2O5(OH)4 + K+ + 2 H4SiO4');
    const status = element.querySelector('tl-balance-status');
    expect(status?.getAttribute('data-status')).toBe('unbalanced');
    expect(status?.textContent).toContain('unbalanced');
    expect(status?.querySelector('mat-icon')?.textContent?.trim()).toBe('error');
    const offRows = [...element.querySelectorAll('.residuals tr.is-off th')].map((cell) => cell.textContent?.trim());
    expect(offRows).toEqual(['Al', 'Si', 'O', 'H', 'charge']);
  });

  it('shows the proton budget per mole, per kg, per tonne and as kg CaCO3 per tonne', () => {
    const element = render('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    const figures = element.querySelector('.protons')?.textContent ?? '';
    expect(figures).toContain('per mole of FeS2');
    expect(figures).toContain('33.343');
    expect(figures).toContain('16.69');
    expect(element.querySelector('.electrons')?.textContent).toContain('15/4');
  });

  it('says why the text does not read and underlines where', () => {
    const element = render('CaCO3 + 2 H+ -> Ca2+ + CO2 + H2O');
    expect(element.querySelector('[role="alert"] .message')?.textContent).toContain('Ca^2+');
    expect(element.querySelector('mark.culprit')?.textContent).toBe('Ca2+');
  });
});
