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
