import type PDFDocument from 'pdfkit';
import { fontFiles, runsBySubset, type FontStyle } from './fonts';

type Doc = InstanceType<typeof PDFDocument>;
export type TextOptions = PDFKit.Mixins.TextOptions & {
  style?: FontStyle;
  size?: number;
  color?: string;
};

export const INK = '#2b2622';
export const FAINT = '#6b625a';
export const GALL = '#7a4a2a';
export const RULE = '#d9cfc2';

/** Registers every EB Garamond subset with the document. */
export function registerFonts(doc: Doc): void {
  for (const { name, file } of fontFiles()) doc.registerFont(name, file);
}

/** Writes text in EB Garamond, switching subset files mid-line where a glyph needs it. */
export function write(
  doc: Doc,
  text: string,
  options: TextOptions = {},
  at?: { x: number; y: number },
): Doc {
  const { style = 'regular', size = 10.5, color = INK, continued, ...rest } = options;
  doc.fontSize(size).fillColor(color);
  const runs = runsBySubset(text || ' ', style);
  runs.forEach((run, index) => {
    doc.font(run.font);
    const last = index === runs.length - 1;
    const runOptions = { ...rest, continued: last ? continued : true };
    if (index === 0 && at) doc.text(run.text, at.x, at.y, runOptions);
    else doc.text(run.text, runOptions);
  });
  return doc;
}

/**
 * One table cell on one line. Each run of another font subset (Δ is only in the Greek one)
 * is measured and placed at its own x: pdfkit aligns each run of a `continued` line on its
 * own, so a right-aligned "ΔL*" drew its Δ over the L*.
 */
export function writeCell(
  doc: Doc,
  text: string,
  cell: { x: number; y: number; width: number; align: 'left' | 'right'; style?: FontStyle },
  options: { size?: number; color?: string } = {},
): void {
  const { size = 10.5, color = INK } = options;
  const runs = runsBySubset(text || ' ', cell.style ?? 'regular');
  doc.fontSize(size).fillColor(color);
  const widths = runs.map((run) => doc.font(run.font).widthOfString(run.text));
  const total = widths.reduce((sum, width) => sum + width, 0);
  let x = cell.align === 'right' ? cell.x + cell.width - total : cell.x;
  runs.forEach((run, index) => {
    doc.font(run.font).text(run.text, x, cell.y, { lineBreak: false });
    x += widths[index]!;
  });
}

/** Starts a new page when fewer than `needed` points are left above the bottom margin. */
export function ensureSpace(doc: Doc, needed: number): void {
  if (doc.y + needed > doc.page.height - doc.page.margins.bottom) doc.addPage();
}

/** A section heading with a thin rule under it. */
export function heading(doc: Doc, text: string): void {
  ensureSpace(doc, 60);
  doc.moveDown(0.8);
  write(doc, text, { style: 'semibold', size: 14, color: GALL });
  const y = doc.y + 2;
  doc
    .moveTo(doc.page.margins.left, y)
    .lineTo(doc.page.width - doc.page.margins.right, y)
    .lineWidth(0.5)
    .strokeColor(RULE)
    .stroke();
  doc.y = y + 6;
  doc.x = doc.page.margins.left;
}

/** Label–value lines in two columns. */
export function fields(doc: Doc, rows: Array<[string, string | null | undefined]>): void {
  const left = doc.page.margins.left;
  const valueX = left + 110;
  const width = doc.page.width - doc.page.margins.right - valueX;
  for (const [label, value] of rows) {
    ensureSpace(doc, 16);
    const y = doc.y;
    write(doc, label, { color: FAINT, width: 105 }, { x: left, y });
    const labelBottom = doc.y;
    write(doc, value || '—', { width }, { x: valueX, y });
    doc.y = Math.max(doc.y, labelBottom) + 1;
  }
  doc.x = left;
}
