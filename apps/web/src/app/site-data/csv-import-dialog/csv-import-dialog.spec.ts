import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { of } from 'rxjs';

import { CsvImportDialog, type CsvImportDialogData, type CsvPreviewLike } from './csv-import-dialog';

describe('CsvImportDialog', () => {
  const preview: CsvPreviewLike = {
    rows: [
      { line: 2, name: 'KF-SP-01', isValid: true, issues: [] },
      { line: 3, name: 'KF-SP-02', isValid: false, issues: [{ code: 'CSV_BAD_VALUE', message: 'Ca: “n.d.” is not a number.', line: 3, column: 'Ca (mg/L)' }] },
    ],
    issues: [{ code: 'CSV_BAD_VALUE', message: 'Ca: “n.d.” is not a number.', line: 3, column: 'Ca (mg/L)' }],
    validCount: 1,
    invalidCount: 1,
  };

  async function render() {
    const save = vi.fn(() => of({ created: [{}], skippedLines: [3] }));
    const close = vi.fn();
    const data: CsvImportDialogData = { title: 'Upload water analyses', layout: 'One row per sample.', things: 'water analyses', preview: () => of(preview), save, downloadTemplate: () => undefined };
    TestBed.configureTestingModule({
      imports: [CsvImportDialog],
      providers: [provideZonelessChangeDetection(), { provide: MAT_DIALOG_DATA, useValue: data }, { provide: MatDialogRef, useValue: { close } }],
    });
    const fixture = TestBed.createComponent(CsvImportDialog);
    fixture.detectChanges();
    const input = fixture.nativeElement.querySelector('input[type=file]') as HTMLInputElement;
    Object.defineProperty(input, 'files', { value: [new File(['sample\n'], 'waters.csv', { type: 'text/csv' })] });
    input.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    fixture.detectChanges();
    return { element: fixture.nativeElement as HTMLElement, save, close };
  }

  it('shows every problem by line and column before anything is saved', async () => {
    const { element, save } = await render();
    expect(element.querySelector('.issues tbody th')?.textContent).toBe('Line 3, column “Ca (mg/L)”');
    expect(element.querySelector('.issues td')?.textContent).toContain('n.d.');
    expect(element.querySelector('.rows')?.textContent).toContain('left out');
    expect(save).not.toHaveBeenCalled();
  });

  it('on confirm saves the valid rows, leaving the invalid ones out, and closes with the count', async () => {
    const { element, save, close } = await render();
    const button = [...element.querySelectorAll('button')].find((node) => node.textContent?.includes('Save 1 valid')) as HTMLButtonElement;
    expect(button.textContent).toContain('leave 1 out');
    button.click();
    expect(save).toHaveBeenCalledWith(expect.any(File), true);
    expect(close).toHaveBeenCalledWith(1);
  });
});
