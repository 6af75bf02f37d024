// Source of the rendered reaction: complete pyrite oxidation, Itasca Denver report to Colorado DRMS, eq. 3.1;
// the checks are about rendering (sub- and superscripts, stacked 15/4), not new chemistry.
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';

import { EquationView } from './equation-view';

describe('EquationView', () => {
  function render(equation: string, isCompact = false): HTMLElement {
    TestBed.configureTestingModule({ imports: [EquationView], providers: [provideZonelessChangeDetection()] });
    const fixture = TestBed.createComponent(EquationView);
    fixture.componentRef.setInput('equation', equation);
    fixture.componentRef.setInput('isCompact', isCompact);
    fixture.detectChanges();
    return fixture.nativeElement as HTMLElement;
  }

  it('writes charges as superscripts, counts as subscripts and fractions stacked', () => {
    const element = render('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    expect([...element.querySelectorAll('sup')].map((node) => node.textContent)).toEqual(['2-', '+']);
    expect(element.querySelector('.stack .num')?.textContent).toBe('15');
    expect(element.querySelector('.stack .den')?.textContent).toBe('4');
    expect(element.querySelector('.arrow')?.textContent).toBe('→');
  });

  it('slashes fractions in compact mode and keeps the plain text for screen readers', () => {
    const element = render('FeS2 + 15/4 O2 -> FeO + 2 SO3', true);
    expect(element.querySelector('.stack')).toBeNull();
    expect(element.querySelector('.slash')).not.toBeNull();
    expect(element.querySelector('tl-fraction .tl-visually-hidden')?.textContent).toBe('15/4');
  });
});
