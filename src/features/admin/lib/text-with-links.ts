/** A run of a message's text: plain words, or a web address to show as a link. */
export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; href: string };

const ADDRESS = /https?:\/\/[^\s<>"]+/g;
/** Punctuation that ends a sentence after an address belongs to the sentence, not the address. */
const TRAILING = /[.,;:!?'")\]]+$/;

/**
 * Splits plain text into text and http(s) addresses, so only those two schemes ever become links
 * (never `javascript:` or `data:`). Joining the parts back gives the text unchanged.
 */
export function splitLinks(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let at = 0;
  for (const match of text.matchAll(ADDRESS)) {
    const start = match.index;
    const href = match[0].replace(TRAILING, '');
    if (start > at) parts.push({ kind: 'text', text: text.slice(at, start) });
    parts.push({ kind: 'link', href });
    at = start + href.length;
  }
  if (at < text.length) parts.push({ kind: 'text', text: text.slice(at) });
  return parts;
}
