import { fileURLToPath } from 'node:url';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

/** Extracts the text of every page of a PDF with Mozilla's PDF.js, joined page by page. */
export async function pdfText(bytes: Uint8Array): Promise<string> {
  const standardFontDataUrl = fileURLToPath(new URL('../../node_modules/pdfjs-dist/standard_fonts/', import.meta.url));
  const doc = await getDocument({ data: bytes.slice(), standardFontDataUrl, isEvalSupported: false }).promise;
  const pages: string[] = [];
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' '));
  }
  await doc.destroy();
  return pages.join('\n');
}
