/** A run of message text: plain, or a web address to show as a link. */
export interface TextPart {
  text: string;
  isLink: boolean;
}

const LINK_PATTERN = /https?:\/\/[^\s<>"]+/g;
/** Sentence punctuation that ends a sentence rather than the address. */
const TRAILING_PUNCTUATION = /[.,;:!?)\]]+$/;

/**
 * Splits plain text into plain runs and http(s) addresses, so a template can render
 * the addresses as links without ever treating the text as HTML.
 *
 * @param text an e-mail's plain text
 * @example splitLinks('Open https://a.org/x.') → [{text:'Open ',isLink:false},{text:'https://a.org/x',isLink:true},{text:'.',isLink:false}]
 */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let position = 0;
  for (const match of text.matchAll(LINK_PATTERN)) {
    const start = match.index ?? 0;
    const address = match[0].replace(TRAILING_PUNCTUATION, '');
    pushPlain(parts, text.slice(position, start));
    parts.push({ text: address, isLink: true });
    position = start + address.length;
  }
  pushPlain(parts, text.slice(position));
  return parts;
}

function pushPlain(parts: TextPart[], text: string): void {
  if (text.length > 0) {
    parts.push({ text, isLink: false });
  }
}
