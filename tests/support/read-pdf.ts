import { PDFParse } from 'pdf-parse';
import type { Test } from 'supertest';

/** The text and page count of a PDF, read back with pdf-parse (a PDF.js-based reader). */
export async function readPdf(bytes: Buffer): Promise<{ text: string; pages: number }> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    const result = await parser.getText();
    return { text: result.text, pages: result.total };
  } finally {
    await parser.destroy();
  }
}

/** Makes supertest keep a binary body as a Buffer in `response.body`. */
export function asBuffer(test: Test): Test {
  return test.buffer(true).parse((response, callback) => {
    const chunks: Buffer[] = [];
    response.on('data', (chunk: Buffer) => chunks.push(chunk));
    response.on('end', () => callback(null, Buffer.concat(chunks)));
  });
}

/** One piece of text as drawn: its page, left edge, baseline and width (PDF points). */
export interface PdfTextItem {
  page: number;
  text: string;
  x: number;
  y: number;
  width: number;
}

/**
 * Every drawn piece of text with its position, read by PDF.js (the engine pdf-parse wraps),
 * so a test can check that cells of a table do not overlap.
 */
export async function readPdfItems(bytes: Buffer): Promise<PdfTextItem[]> {
  const { getDocument } = await import('pdfjs-dist/legacy/build/pdf.mjs');
  const doc = await getDocument({ data: new Uint8Array(bytes), verbosity: 0 }).promise;
  const items: PdfTextItem[] = [];
  try {
    for (let page = 1; page <= doc.numPages; page += 1) {
      const content = await (await doc.getPage(page)).getTextContent();
      for (const item of content.items) {
        if (!('str' in item) || item.str.trim() === '') continue;
        const [, , , , x, y] = item.transform as number[];
        items.push({ page, text: item.str, x: x!, y: y!, width: item.width });
      }
    }
  } finally {
    await doc.destroy();
  }
  return items;
}
