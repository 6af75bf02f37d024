import { CSV_FILE_FIELD, CSV_MAX_BYTES, CSV_SKIP_INVALID_FIELD } from '@tallus/contracts';
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { BadRequestError } from '../errors/app-errors';

/** Multipart middleware of CSV uploads: one file in memory, at most `CSV_MAX_BYTES`. */
export function csvUpload(): RequestHandler {
  return multer({ storage: multer.memoryStorage(), limits: { fileSize: CSV_MAX_BYTES, files: 1 } }).single(CSV_FILE_FIELD);
}

/**
 * The uploaded CSV and the `skipInvalid` choice of a request behind {@link csvUpload}.
 *
 * @throws BadRequestError IMPORT_INVALID when no file came
 */
export function uploadedCsv(req: Request): { file: Buffer; skipInvalid: boolean } {
  if (!req.file) {
    throw new BadRequestError('IMPORT_INVALID', `Send the CSV as multipart/form-data in the field "${CSV_FILE_FIELD}".`, [
      { code: 'CSV_NO_FILE', message: 'No file was uploaded.', path: [CSV_FILE_FIELD] },
    ]);
  }
  const body = (req.body ?? {}) as Record<string, unknown>;
  return { file: req.file.buffer, skipInvalid: body[CSV_SKIP_INVALID_FIELD] === 'true' };
}

/**
 * A safe file name for a download: letters, digits, dashes.
 *
 * @param fallback the name when `base` has no safe character left
 */
export function downloadName(base: string, extension: string, fallback = 'tallus'): string {
  const slug = base.normalize('NFKD').replace(/[^\w-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 80) || fallback;
  return `${slug}.${extension}`;
}
