import { Injectable, inject } from '@angular/core';
import { MatDialog } from '@angular/material/dialog';
import { Observable } from 'rxjs';

import { Notifier } from '../core/notifier';
import { toProblem } from '../core/problem';
import { CsvImportDialog, type CsvImportDialogData, type CsvPreviewLike } from './csv-import-dialog/csv-import-dialog';
import { saveBlob } from './save-file';

/** The CSV calls a kind of team record offers (water analyses, rock samples). */
export interface CsvRecordsApi {
  preview(teamId: string, file: File): Observable<CsvPreviewLike>;
  import(teamId: string, file: File, skipInvalid: boolean): Observable<{ created: readonly unknown[]; skippedLines: readonly number[] }>;
  exportCsv(teamId: string): Observable<Blob>;
  templateCsv(teamId: string): Observable<Blob>;
}

/** The words and file names of one kind of CSV upload and download. */
export interface CsvRecordsKind {
  api: CsvRecordsApi;
  /** e.g. "Upload water analyses". */
  title: string;
  /** One line on the columns, shown in the upload dialog. */
  layout: string;
  /** The plural of the rows' thing, e.g. "water analyses". */
  things: string;
  /** File names the browser proposes for the export and the empty template. */
  fileNames: { export: string; template: string };
}

/**
 * Upload (preview, then confirm) and download of a team's records as CSV, the same for every
 * kind of site record: the pages give the calls and the words.
 */
@Injectable({ providedIn: 'root' })
export class CsvTransfer {
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  /**
   * Opens the upload dialog; after a save, confirms the count and calls `saved`.
   *
   * @param saved e.g. reloads the page's list
   */
  upload(kind: CsvRecordsKind, teamId: string, saved: () => void): void {
    const data: CsvImportDialogData = {
      title: kind.title,
      layout: kind.layout,
      things: kind.things,
      preview: (file) => kind.api.preview(teamId, file),
      save: (file, skipInvalid) => kind.api.import(teamId, file, skipInvalid),
      downloadTemplate: () => this.download(kind, teamId, 'template'),
    };
    this.dialog
      .open(CsvImportDialog, { data, width: '760px' })
      .afterClosed()
      .subscribe((count: number | undefined) => {
        if (count === undefined) return;
        this.notifier.success(`${count} ${kind.things} saved.`);
        saved();
      });
  }

  /** Downloads the team's records, or the empty template with the expected columns. */
  download(kind: CsvRecordsKind, teamId: string, which: 'export' | 'template'): void {
    const call = which === 'export' ? kind.api.exportCsv(teamId) : kind.api.templateCsv(teamId);
    call.subscribe({
      next: (blob) => saveBlob(blob, kind.fileNames[which]),
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }
}
