import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { CsvIssue } from '@tallus/contracts';
import { Observable } from 'rxjs';

import { describeProblem } from '../../core/error-messages';
import { toProblem } from '../../core/problem';

/** Largest CSV the API accepts (CSV_MAX_BYTES of the contracts). */
const MAX_BYTES = 2 * 1024 * 1024;

/** What the dialog needs of a preview: rows with their issues, and every issue. */
export interface CsvPreviewLike {
  rows: readonly { line: number; name: string; isValid: boolean; issues: readonly CsvIssue[] }[];
  issues: readonly CsvIssue[];
  validCount: number;
  invalidCount: number;
}

/** The calls and words of one kind of CSV upload (water analyses, rock samples). */
export interface CsvImportDialogData {
  /** e.g. "Upload water analyses". */
  title: string;
  /** One line on the layout, e.g. "One row per sample: sample, site, date, …, Ca (mg/L), …". */
  layout: string;
  /** The plural of the rows' thing, e.g. "water analyses". */
  things: string;
  preview(file: File): Observable<CsvPreviewLike>;
  /** Saves the valid rows; `skipInvalid` leaves the invalid ones out. */
  save(file: File, skipInvalid: boolean): Observable<{ created: readonly unknown[]; skippedLines: readonly number[] }>;
  downloadTemplate(): void;
}

/**
 * A CSV upload in two steps: the server checks the file and this dialog shows every problem by
 * line and column, saving nothing; then the user confirms, and the valid rows are saved in one
 * transaction. Closes with the number of rows saved.
 */
@Component({
  selector: 'tl-csv-import-dialog',
  imports: [MatButtonModule, MatDialogModule, MatIconModule, MatProgressBarModule],
  templateUrl: './csv-import-dialog.html',
  styleUrl: './csv-import-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CsvImportDialog {
  private readonly dialogRef = inject<MatDialogRef<CsvImportDialog, number>>(MatDialogRef);
  protected readonly data = inject<CsvImportDialogData>(MAT_DIALOG_DATA);

  protected readonly file = signal<File | null>(null);
  protected readonly preview = signal<CsvPreviewLike | null>(null);
  protected readonly step = signal<'idle' | 'checking' | 'saving'>('idle');
  protected readonly error = signal<string | null>(null);
  protected readonly fileIssues = computed(() => (this.preview()?.issues ?? []).filter((issue) => issue.line <= 1));
  protected readonly rowIssues = computed(() => (this.preview()?.issues ?? []).filter((issue) => issue.line > 1));
  protected readonly canSave = computed(() => {
    const preview = this.preview();
    return preview !== null && preview.validCount > 0 && this.fileIssues().length === 0 && this.step() === 'idle';
  });

  protected pick(event: Event): void {
    const file = (event.target as HTMLInputElement).files?.[0] ?? null;
    this.preview.set(null);
    this.error.set(null);
    if (file && file.size > MAX_BYTES) {
      this.error.set(`The file has ${(file.size / 1024 / 1024).toFixed(1)} MB; Tallus reads CSV files up to 2 MB.`);
      this.file.set(null);
      return;
    }
    this.file.set(file);
    if (file) this.check(file);
  }

  protected save(): void {
    const file = this.file();
    const preview = this.preview();
    if (!file || !preview) return;
    this.step.set('saving');
    this.data.save(file, preview.invalidCount > 0).subscribe({
      next: (answer) => this.dialogRef.close(answer.created.length),
      error: (error: unknown) => {
        this.step.set('idle');
        this.error.set(`Nothing was saved. ${describeProblem(toProblem(error))}`);
      },
    });
  }

  protected where(issue: CsvIssue): string {
    if (issue.line === 0) return 'File';
    const line = issue.line === 1 ? 'Header' : `Line ${issue.line}`;
    return issue.column ? `${line}, column “${issue.column}”` : line;
  }

  private check(file: File): void {
    this.step.set('checking');
    this.data.preview(file).subscribe({
      next: (preview) => {
        this.step.set('idle');
        this.preview.set(preview);
      },
      error: (error: unknown) => {
        this.step.set('idle');
        this.error.set(describeProblem(toProblem(error)));
      },
    });
  }
}
