import { createRequire } from 'node:module';

/** A pdfmake content node (the subset Tallus uses: text, tables, columns, stacks, canvas). */
export type PdfContent = string | PdfContent[] | { [key: string]: unknown };

/** A pdfmake document definition. */
export interface PdfDocument {
  info?: { title: string; author?: string; subject?: string };
  content: PdfContent[];
  styles?: Record<string, Record<string, unknown>>;
  defaultStyle?: Record<string, unknown>;
  pageSize?: string;
  pageOrientation?: 'portrait' | 'landscape';
  pageMargins?: [number, number, number, number];
  footer?: (currentPage: number, pageCount: number) => PdfContent;
  compress?: boolean;
}

/** The part of pdfmake's server build Tallus uses (the package ships no types). */
interface PdfMakeServer {
  setFonts(fonts: Record<string, Record<string, string>>): void;
  setUrlAccessPolicy(policy: (url: string) => boolean): void;
  setLocalAccessPolicy(policy: (path: string) => boolean): void;
  createPdf(document: PdfDocument): { getBuffer(): Promise<Buffer> };
}

const require = createRequire(import.meta.url);

/** The Roboto TTF files shipped in pdfmake's npm package (nothing is fetched). */
function robotoFiles(): Record<string, string> {
  const file = (name: string) => require.resolve(`pdfmake/build/fonts/Roboto/${name}`);
  return { normal: file('Roboto-Regular.ttf'), bold: file('Roboto-Medium.ttf'), italics: file('Roboto-Italic.ttf'), bolditalics: file('Roboto-MediumItalic.ttf') };
}

/**
 * Renders a document to PDF bytes with pdfmake and the shipped Roboto fonts.
 * No URL is ever fetched; only the four font files may be read from disk.
 *
 * @param options.compress whether streams are deflated (default true; tests may turn it off)
 */
export async function renderPdf(document: PdfDocument, options: { compress?: boolean } = {}): Promise<Buffer> {
  // pdfmake's server build is a configured singleton: set what this render needs every time, so no state leaks between calls.
  const pdfmake = require('pdfmake') as PdfMakeServer;
  const fonts = robotoFiles();
  const allowed = new Set(Object.values(fonts));
  pdfmake.setFonts({ Roboto: fonts });
  pdfmake.setUrlAccessPolicy(() => false);
  pdfmake.setLocalAccessPolicy((path) => allowed.has(path));
  return pdfmake.createPdf({ ...document, compress: options.compress ?? true }).getBuffer();
}
