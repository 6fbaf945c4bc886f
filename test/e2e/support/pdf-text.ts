// Reads a PDF back for the e2e tests (page count and each page's text), the one place that uses
// pdfjs-dist (Mozilla's PDF reader), so a printed sheet is checked by a reader that shares nothing
// with the browser that printed it.

import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

export async function pdfPages(bytes: Uint8Array): Promise<string[]> {
  const doc = await getDocument({ data: bytes, useSystemFonts: false, isEvalSupported: false }).promise;
  try {
    const pages: string[] = [];
    for (let i = 1; i <= doc.numPages; i++) {
      const page = await doc.getPage(i);
      const content = await page.getTextContent();
      pages.push(content.items.map((item) => ('str' in item ? item.str : '')).join(' ').replace(/\s+/g, ' '));
    }
    return pages;
  } finally {
    await doc.destroy();
  }
}
