// Source of the molar mass: kaolinite Al2Si2O5(OH)4 = 258.157 g/mol, computed from the IUPAC 2021 abridged
// atomic weights (Prohaska et al. 2022, Pure Appl. Chem. 94, 573), as tabulated in shared/reference/check-values.md §1b.
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { FormControl } from '@angular/forms';

import { FormulaField } from './formula-field';
import { formulaValidator } from './formula-check';

describe('FormulaField', () => {
  async function render(text: string): Promise<HTMLElement> {
    vi.useFakeTimers();
    TestBed.configureTestingModule({ imports: [FormulaField], providers: [provideZonelessChangeDetection()] });
    const fixture = TestBed.createComponent(FormulaField);
    const control = new FormControl(text, { nonNullable: true, validators: [formulaValidator] });
    control.markAsTouched();
    fixture.componentRef.setInput('control', control);
    fixture.detectChanges();
    vi.advanceTimersByTime(100);
    vi.useRealTimers();
    await fixture.whenStable();
    fixture.detectChanges();
    return fixture.nativeElement as HTMLElement;
  }

  it('renders the formula with subscripts and shows its molar mass (kaolinite 258.157 g/mol, IUPAC 2021)', async () => {
    const element = await render('Al2Si2O5(OH)4');
    expect([...element.querySelectorAll('.rendered sub')].map((node) => node.textContent)).toEqual(['2', '2', '5', '4']);
    expect(element.querySelector('.mass .value')?.textContent?.trim()).toBe('258.157');
  });

  it('says what is wrong and underlines the place where the formula stops reading', async () => {
    const element = await render('(Mg,Fe)2SiO4');
    expect(element.querySelector('mat-error')?.textContent).toContain('(Mg0.9,Fe0.1)2SiO4');
    expect(element.querySelector('mark.culprit')?.textContent).toBe('(Mg,Fe)');
  });
});
