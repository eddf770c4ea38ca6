// Reads a PDF the way a person would: its page count and the text of each page, through pdfjs-dist
// (Mozilla's PDF renderer), so a test checks what a printed report says rather than its HTML.
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export async function pdfText(bytes: Uint8Array): Promise<{ pages: number; text: string[] }> {
  const document = await getDocument({ data: bytes, useSystemFonts: true, isEvalSupported: false }).promise;
  try {
    const text: string[] = [];
    for (let n = 1; n <= document.numPages; n++) {
      const content = await (await document.getPage(n)).getTextContent();
      text.push(content.items.map((item) => ('str' in item ? item.str + (item.hasEOL ? '\n' : '') : '')).join(''));
    }
    return { pages: document.numPages, text };
  } finally {
    await document.destroy();
  }
}
