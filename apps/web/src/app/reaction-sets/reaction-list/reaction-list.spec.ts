// The reaction is the calcite dissolution of the demo set; the checks are about the list's layout, not chemistry.
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { Reaction } from '@tallus/contracts';

import { ReactionList } from './reaction-list';

const reaction = {
  id: 'r1', setId: 's1', position: 0, name: 'Calcite dissolution', kind: 'dissolution', equation: 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O',
  reference: null, citation: '', notes: '', version: 1, updatedAt: '',
  result: { status: 'balanced', balancedEquation: 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O', protonBudget: { reference: 'CaCO3', perMole: '-2' } },
} as unknown as Reaction;

describe('ReactionList', () => {
  function render(isEditable: boolean): HTMLElement {
    TestBed.configureTestingModule({ imports: [ReactionList], providers: [provideZonelessChangeDetection()] });
    const fixture = TestBed.createComponent(ReactionList);
    fixture.componentRef.setInput('reactions', [reaction]);
    fixture.componentRef.setInput('isEditable', isEditable);
    fixture.detectChanges();
    return fixture.nativeElement as HTMLElement;
  }

  it.each([true, false])('keeps the six grid cells of a row whether the set takes edits (%s) or is read-only, so the equation keeps its width', (isEditable) => {
    const row = render(isEditable).querySelector('li.row')!;
    const cellName = (cell: Element) => ['handle', 'place', 'main', 'proton', 'moves'].find((name) => cell.classList.contains(name)) ?? cell.tagName.toLowerCase();
    expect([...row.children].map(cellName)).toEqual(['handle', 'place', 'main', 'tl-balance-status', 'proton', 'moves']);
    expect(row.querySelectorAll('.moves button').length).toBe(isEditable ? 2 : 0);
  });
});
