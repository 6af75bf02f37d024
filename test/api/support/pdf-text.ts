import { inflateSync } from 'node:zlib';

/** One indirect object of a PDF: its dictionary text and its (inflated) stream. */
interface PdfObject {
  dictionary: string;
  stream: Buffer | null;
}

function readObjects(pdf: Buffer): Map<number, PdfObject> {
  const text = pdf.toString('latin1');
  const objects = new Map<number, PdfObject>();
  const pattern = /(\d+) 0 obj\s*([\s\S]*?)endobj/g;
  for (let match = pattern.exec(text); match; match = pattern.exec(text)) {
    const body = match[2];
    const streamAt = body.indexOf('stream');
    if (streamAt === -1) {
      objects.set(Number(match[1]), { dictionary: body, stream: null });
      continue;
    }
    const dictionary = body.slice(0, streamAt);
    const start = match.index + match[0].indexOf(body) + streamAt + 'stream'.length + (body[streamAt + 6] === '\r' ? 2 : 1);
    const end = text.indexOf('endstream', start);
    const raw = pdf.subarray(start, end);
    objects.set(Number(match[1]), { dictionary, stream: dictionary.includes('/FlateDecode') ? inflateSync(raw) : raw });
  }
  return objects;
}

/** Glyph code (hex) → text, from a ToUnicode CMap (bfchar and bfrange with arrays or a start value). */
function readCmap(cmap: string): Map<string, string> {
  const map = new Map<string, string>();
  // Targets may hold several code units separated by spaces (ligatures: <0066 0066 0069> is "ffi").
  const unicode = (hex: string) => String.fromCodePoint(...(hex.replace(/\s+/g, '').match(/.{4}/g) ?? []).map((unit) => parseInt(unit, 16)));
  for (const block of cmap.matchAll(/beginbfchar([\s\S]*?)endbfchar/g)) {
    for (const [, code, target] of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>/g)) map.set(code.toLowerCase(), unicode(target));
  }
  for (const block of cmap.matchAll(/beginbfrange([\s\S]*?)endbfrange/g)) {
    for (const [, from, to, rest] of block[1].matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>\s*(\[[^\]]*\]|<[0-9a-fA-F\s]+>)/g)) {
      const first = parseInt(from, 16);
      const targets = rest.startsWith('[') ? [...rest.matchAll(/<([0-9a-fA-F\s]+)>/g)].map((entry) => entry[1]) : null;
      for (let code = first; code <= parseInt(to, 16); code++) {
        const key = code.toString(16).padStart(from.length, '0');
        const target = targets ? targets[code - first] : (parseInt(rest.slice(1, -1), 16) + code - first).toString(16).padStart(4, '0');
        if (target) map.set(key, unicode(target));
      }
    }
  }
  return map;
}

/**
 * The text of a pdfmake/pdfkit PDF: streams inflated with node:zlib, glyph codes
 * of the embedded font subsets mapped back through each font's ToUnicode CMap,
 * whitespace collapsed. Enough to check what a report says.
 */
export function pdfText(pdf: Buffer): string {
  const objects = readObjects(pdf);
  const cmaps = new Map<string, Map<string, string>>();
  for (const object of objects.values()) {
    for (const [, name, ref] of object.dictionary.matchAll(/\/(F\d+)\s+(\d+) 0 R/g)) {
      const font = objects.get(Number(ref));
      const toUnicode = font?.dictionary.match(/\/ToUnicode\s+(\d+) 0 R/);
      const cmap = toUnicode ? objects.get(Number(toUnicode[1]))?.stream : undefined;
      if (cmap) cmaps.set(name, readCmap(cmap.toString('latin1')));
    }
  }
  const parts: string[] = [];
  for (const object of objects.values()) {
    if (!object.stream || !/BT[\s\S]*ET/.test(object.stream.toString('latin1'))) continue;
    let cmap = new Map<string, string>();
    for (const [, font, array, single] of object.stream.toString('latin1').matchAll(/\/(F\d+)\s+[\d.]+\s+Tf|\[((?:[^\]]|\\\])*)\]\s*TJ|<([0-9a-fA-F]*)>\s*Tj/g)) {
      if (font) cmap = cmaps.get(font) ?? new Map();
      const hexes = array ? [...array.matchAll(/<([0-9a-fA-F]*)>/g)].map((entry) => entry[1]) : single !== undefined ? [single] : [];
      const fragment = hexes.map((hex) => (hex.match(/.{4}/g) ?? []).map((code) => cmap.get(code.toLowerCase()) ?? '').join('')).join('');
      if (fragment === '') continue;
      // pdfmake writes each word as its own fragment, keeping its trailing space or its break character (- / –): anything else is a new cell or line.
      const last = parts.at(-1)?.at(-1) ?? ' ';
      parts.push(/[\s\-/–—]/.test(last) ? fragment : ` ${fragment}`);
    }
  }
  return parts.join('').replace(/\s+/g, ' ');
}
