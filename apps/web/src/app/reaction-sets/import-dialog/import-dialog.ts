import { HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ProblemIssue, ReactionSetDetail } from '@tallus/contracts';

import { describeIssue, describeProblem } from '../../core/error-messages';
import { toProblem } from '../../core/problem';
import { ReactionSetsApi } from '../reaction-sets-api';

/** Largest file the API accepts (IMPORT_MAX_BYTES of the contracts), in bytes. */
const MAX_BYTES = 5 * 1024 * 1024;

/** One problem of an import file: where in the file, and what is wrong. */
export interface ImportProblem {
  where: string;
  message: string;
}

/**
 * Names the place of an import issue in the user's terms: `reactions[2].equation` becomes
 * "reaction 3, equation".
 *
 * @param issue one issue of the API's IMPORT_INVALID problem
 */
export function describeImportIssue(issue: ProblemIssue): ImportProblem {
  const words: string[] = [];
  const path = issue.path ?? [];
  for (let index = 0; index < path.length; index++) {
    const key = path[index];
    const next = path[index + 1];
    if (typeof next === 'number' && typeof key === 'string') {
      words.push(`${singular(key)} ${next + 1}`);
      index++;
    } else {
      words.push(String(key));
    }
  }
  return { where: words.length > 0 ? words.join(', ') : 'the file', message: describeIssue(issue) };
}

function singular(key: string): string {
  const names: Record<string, string> = { reactions: 'reaction', netReactions: 'net reaction', species: 'species', cancel: 'cancelled species' };
  return names[key] ?? key;
}

/** Uploads a Tallus JSON file as a new draft set, with progress and a report of every problem. */
@Component({
  selector: 'tl-import-dialog',
  imports: [MatButtonModule, MatDialogModule, MatIconModule, MatProgressBarModule],
  templateUrl: './import-dialog.html',
  styleUrl: './import-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ImportDialog {
  private readonly api = inject(ReactionSetsApi);
  private readonly dialogRef = inject<MatDialogRef<ImportDialog, ReactionSetDetail>>(MatDialogRef);
  private readonly data = inject<{ teamId: string }>(MAT_DIALOG_DATA);

  protected readonly file = signal<File | null>(null);
  /** Upload progress 0–100, or null when not uploading. */
  protected readonly progress = signal<number | null>(null);
  protected readonly error = signal<string | null>(null);
  protected readonly problems = signal<ImportProblem[]>([]);

  protected pick(event: Event): void {
    const file = (event.target as HTMLInputElement).files?.[0] ?? null;
    this.problems.set([]);
    this.error.set(null);
    if (file && file.size > MAX_BYTES) {
      this.error.set(`The file has ${(file.size / 1024 / 1024).toFixed(1)} MB; Tallus imports files up to 5 MB.`);
      this.file.set(null);
      return;
    }
    this.file.set(file);
  }

  protected upload(): void {
    const file = this.file();
    if (!file) return;
    this.progress.set(0);
    this.error.set(null);
    this.problems.set([]);
    this.api.import(this.data.teamId, file).subscribe({
      next: (event) => {
        if (event.type === HttpEventType.UploadProgress) {
          this.progress.set(event.total ? Math.round((100 * event.loaded) / event.total) : 50);
        } else if (event.type === HttpEventType.Response && event.body) {
          this.dialogRef.close(event.body);
        }
      },
      error: (error: unknown) => {
        this.progress.set(null);
        const problem = toProblem(error);
        this.problems.set((problem.issues ?? []).map(describeImportIssue));
        this.error.set(problem.code === 'IMPORT_INVALID' ? 'The file was not imported; nothing was saved. Fix these problems and try again:' : describeProblem(problem));
      },
    });
  }
}
