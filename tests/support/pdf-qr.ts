import jsQR from 'jsqr';
import { PDFParse } from 'pdf-parse';
import sharp from 'sharp';

/**
 * Every QR code drawn in a PDF, decoded: pdf-parse (PDF.js) extracts each embedded image,
 * sharp turns it into RGBA pixels, and jsQR (a QR reader from the registry) reads it.
 */
export async function qrCodesInPdf(bytes: Buffer): Promise<Array<{ page: number; text: string }>> {
  const parser = new PDFParse({ data: new Uint8Array(bytes) });
  try {
    const result = await parser.getImage({ imageBuffer: true, imageDataUrl: false });
    const found: Array<{ page: number; text: string }> = [];
    for (const page of result.pages) {
      for (const image of page.images) {
        const { data, info } = await sharp(Buffer.from(image.data))
          .ensureAlpha()
          .raw()
          .toBuffer({ resolveWithObject: true });
        const code = jsQR(new Uint8ClampedArray(data), info.width, info.height);
        if (code) found.push({ page: page.pageNumber, text: code.data });
      }
    }
    return found;
  } finally {
    await parser.destroy();
  }
}
