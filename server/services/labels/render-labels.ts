import PDFDocument from 'pdfkit';
import QRCode from 'qrcode';
import { POINTS_PER_MM, labelBoxes, type LabelSheet } from '../../../shared/domain/label-sheets';
import { FAINT, INK, registerFonts, write } from '../report/pdf-text';

/** What one label says and where its QR code leads. */
export interface LabelContent {
  code: string;
  title: string;
  /** A smaller line under the title (a place's full name, a print's maker). */
  note?: string | null;
  url: string;
}

/** Padding inside each label, so printing a little off the die-cut keeps the code whole. */
const PADDING_MM = 3;

/**
 * The QR code as a PNG: error correction M (about 15 % of the symbol may be damaged, a
 * scuffed box end still reads) and a quiet zone of 4 modules, as ISO/IEC 18004 asks.
 */
function qrPng(url: string): Promise<Buffer> {
  return QRCode.toBuffer(url, { type: 'png', errorCorrectionLevel: 'M', margin: 4, scale: 6 });
}

/** Label sheets as a PDF: each label a QR code on the left, code and title on the right. */
export async function renderLabels(
  sheet: LabelSheet,
  labels: readonly LabelContent[],
  options: { skip?: number; title: string },
): Promise<Buffer> {
  const mm = (value: number) => value * POINTS_PER_MM;
  const doc = new PDFDocument({
    size: [mm(sheet.pageWidthMm), mm(sheet.pageHeightMm)],
    margin: 0,
    autoFirstPage: false,
    info: { Title: options.title, Creator: 'Printwarden' },
  });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const images = await Promise.all(labels.map((label) => qrPng(label.url)));
  const boxes = labelBoxes(sheet, labels.length, options.skip ?? 0);
  let page = -1;
  boxes.forEach((box, index) => {
    while (page < box.page) {
      doc.addPage();
      page += 1;
    }
    const label = labels[index]!;
    const side = Math.min(box.height, box.width / 2) - 2 * PADDING_MM;
    const x = mm(box.x + PADDING_MM);
    const y = mm(box.y + PADDING_MM);
    doc.image(images[index]!, x, y, { width: mm(side), height: mm(side) });
    const textX = x + mm(side + PADDING_MM);
    const width = mm(box.x + box.width - PADDING_MM) - textX;
    const height = mm(box.height - 2 * PADDING_MM);
    const size = Math.min(11, Math.max(7, box.height / 4));
    write(
      doc,
      label.code,
      { style: 'semibold', size, color: INK, width, lineBreak: false },
      {
        x: textX,
        y,
      },
    );
    write(doc, label.title, {
      size: size * 0.8,
      color: INK,
      width,
      height: height * 0.55,
      ellipsis: true,
    });
    if (label.note) {
      write(doc, label.note, {
        size: size * 0.65,
        color: FAINT,
        width,
        height: height * 0.2,
        ellipsis: true,
      });
    }
  });
  if (page < 0) doc.addPage();
  doc.end();
  return done;
}
