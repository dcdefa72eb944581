import PDFDocument from 'pdfkit';
import { GRADE_DEFINITIONS } from '../../../shared/domain/condition';
import { DENSITY_DIGITS, signedFixed } from '../../../shared/domain/tone/numbers';
import { formatSize } from '../../../shared/domain/units';
import { STAGE_LABELS } from '../../../shared/domain/vocabulary';
import type { ImageArea } from '../../../shared/schemas/condition';
import type { PrintView, ProcessingStepView } from '../../../shared/types/catalogue';
import type { ConditionReportView, TreatmentView } from '../../../shared/types/condition';
import {
  ensureSpace,
  FAINT,
  fields,
  GALL,
  heading,
  registerFonts,
  write,
  writeCell,
} from './pdf-text';
import { drawToneChart } from './tone-chart';
import type { ToneReportData } from './tone-source';

type Doc = InstanceType<typeof PDFDocument>;

/** An image ready for the PDF (JPEG or PNG bytes) with what to mark on it. */
export interface ReportImage {
  bytes: Buffer;
  width: number;
  height: number;
  area?: ImageArea | null;
  caption?: string | null;
}

export interface ReportInput {
  print: PrintView;
  producedBy: { name: string; role: string };
  producedAt: Date;
  condition: ConditionReportView | null;
  treatments: TreatmentView[];
  tone: ToneReportData | null;
  recto: ReportImage | null;
  conditionImages: ReportImage[];
}

const MARGIN = 56;

/** The print's condition and tone report as a PDF (A4, EB Garamond, numbered pages). */
export function renderReport(input: ReportInput): Promise<Buffer> {
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: MARGIN, bottom: MARGIN + 14, left: MARGIN, right: MARGIN },
    bufferPages: true,
    info: {
      Title: `Condition and tone report — ${input.print.accessionNumber} ${input.print.title}`,
      Author: input.producedBy.name,
      Creator: 'Printwarden',
    },
  });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  titleBlock(doc, input);
  recordSection(doc, input);
  processingSection(doc, input.print.processing);
  conditionSection(doc, input.condition, input.conditionImages);
  treatmentsSection(doc, input.treatments);
  toneSection(doc, input.tone);
  footers(doc, input);
  doc.end();
  return done;
}

function titleBlock(doc: Doc, input: ReportInput): void {
  write(doc, 'CONDITION AND TONE REPORT', { size: 9, color: GALL, characterSpacing: 1.5 });
  write(doc, input.print.accessionNumber, { size: 11, color: FAINT });
  write(doc, input.print.title, { style: 'semibold', size: 22 });
  write(
    doc,
    `Produced ${input.producedAt.toISOString().slice(0, 10)} by ${input.producedBy.name} (${input.producedBy.role}).`,
    { style: 'italic', size: 10, color: FAINT },
  );
}

function recordSection(doc: Doc, input: ReportInput): void {
  const { print } = input;
  heading(doc, 'The record');
  const top = doc.y;
  const image = input.recto;
  const imageWidth = 190;
  if (image) {
    const x = doc.page.width - MARGIN - imageWidth;
    doc.image(image.bytes, x, top, { fit: [imageWidth, 240], align: 'right' });
    write(
      doc,
      'Recto',
      { size: 8.5, color: FAINT, width: imageWidth, align: 'right' },
      { x, y: top + fittedHeight(image, imageWidth, 240) + 2 },
    );
    doc.y = top;
  }
  const negative = print.negative ? `${print.negative.code} (${print.negative.kind})` : null;
  fieldsBeside(doc, image ? imageWidth + 16 : 0, [
    ['Maker', print.maker],
    ['Made', print.madeOn],
    ['Process', print.process],
    ['Paper', print.paper?.name],
    ['Negative', negative],
    ['Image size', formatSize(print.imageWidthMm, print.imageHeightMm, 'mm')],
    ['Sheet size', formatSize(print.sheetWidthMm, print.sheetHeightMm, 'mm')],
    ['Edition', print.edition],
    ['Status', print.status],
    ['Place', print.location?.path],
    ['Tone status', print.tone.status],
  ]);
  if (image) doc.y = Math.max(doc.y, top + fittedHeight(image, imageWidth, 240) + 16);
  if (print.description) {
    doc.moveDown(0.4);
    write(doc, print.description, { style: 'italic', width: doc.page.width - 2 * MARGIN });
  }
}

function fieldsBeside(doc: Doc, reserve: number, rows: Array<[string, string | null | undefined]>) {
  const right = doc.page.margins.right;
  doc.page.margins.right = right + reserve;
  fields(doc, rows);
  doc.page.margins.right = right;
}

function fittedHeight(image: ReportImage, maxWidth: number, maxHeight: number): number {
  const scale = Math.min(maxWidth / image.width, maxHeight / image.height);
  return image.height * scale;
}

function stepLine(step: ProcessingStepView): string {
  const parts = [
    step.chemical
      ? `${step.chemical}${step.concentrationPercent != null ? ` ${step.concentrationPercent} % w/v` : ''}`
      : null,
    step.solutionBatch ? `batch ${step.solutionBatch.code}` : null,
    step.method,
    step.coats ? `${step.coats} coat${step.coats > 1 ? 's' : ''}` : null,
    step.lightSource,
    step.minutes != null ? `${step.minutes} min` : null,
    step.temperatureC != null ? `${step.temperatureC} °C` : null,
    step.notes,
  ].filter(Boolean);
  return `${step.position}. ${STAGE_LABELS[step.stage]}${parts.length ? ` — ${parts.join(', ')}` : ''}`;
}

function processingSection(doc: Doc, steps: ProcessingStepView[]): void {
  heading(doc, 'Processing history');
  if (steps.length === 0)
    write(doc, 'No processing steps are recorded.', { style: 'italic', color: FAINT });
  for (const step of steps) {
    ensureSpace(doc, 16);
    write(doc, stepLine(step), { width: doc.page.width - 2 * MARGIN });
  }
}

function conditionSection(
  doc: Doc,
  report: ConditionReportView | null,
  images: ReportImage[],
): void {
  heading(doc, 'Latest condition report');
  if (!report) {
    write(doc, 'No condition report has been written for this print.', {
      style: 'italic',
      color: FAINT,
    });
    return;
  }
  const environment = report.environment
    ? [
        report.environment.temperatureC != null ? `${report.environment.temperatureC} °C` : null,
        report.environment.rh != null ? `${report.environment.rh} % RH` : null,
      ]
        .filter(Boolean)
        .join(', ')
    : null;
  fields(doc, [
    ['Examined', report.reportedOn],
    ['By', report.reportedBy?.name],
    ['Grade', report.grade ? `${report.grade} — ${GRADE_DEFINITIONS[report.grade]}` : null],
    ['Room at the time', environment],
  ]);
  doc.moveDown(0.4);
  write(doc, 'Observations', { style: 'semibold' });
  if (report.observations.length === 0)
    write(doc, 'None recorded.', { style: 'italic', color: FAINT });
  for (const observation of report.observations) {
    ensureSpace(doc, 16);
    write(doc, `• ${observation.term}, ${observation.severity} — ${observation.location}`);
  }
  for (const [label, text] of [
    ['Notes', report.notes],
    ['Recommendation', report.recommendation],
  ] as const) {
    if (!text) continue;
    doc.moveDown(0.4);
    ensureSpace(doc, 30);
    write(doc, label, { style: 'semibold' });
    write(doc, text, { width: doc.page.width - 2 * MARGIN });
  }
  conditionImages(doc, images);
}

/** Two images a row, each with its marked area outlined. */
function conditionImages(doc: Doc, images: ReportImage[]): void {
  if (images.length === 0) return;
  doc.moveDown(0.6);
  const gap = 14;
  const width = (doc.page.width - 2 * MARGIN - gap) / 2;
  const maxHeight = 220;
  for (let index = 0; index < images.length; index += 2) {
    const row = images.slice(index, index + 2);
    const rowHeight = Math.max(...row.map((image) => fittedHeight(image, width, maxHeight))) + 30;
    ensureSpace(doc, rowHeight);
    const top = doc.y;
    row.forEach((image, column) => {
      const x = MARGIN + column * (width + gap);
      const height = fittedHeight(image, width, maxHeight);
      const drawnWidth = image.width * (height / image.height);
      doc.image(image.bytes, x, top, { width: drawnWidth, height });
      if (image.area) {
        doc
          .save()
          .lineWidth(1.5)
          .strokeColor('#c0392b')
          .rect(
            x + image.area.x * drawnWidth,
            top + image.area.y * height,
            image.area.width * drawnWidth,
            image.area.height * height,
          )
          .stroke()
          .restore();
      }
      write(
        doc,
        image.caption ?? `Image ${index + column + 1}`,
        { size: 8.5, color: FAINT, width },
        { x, y: top + height + 3 },
      );
    });
    doc.x = MARGIN;
    doc.y = top + rowHeight;
  }
}

function treatmentsSection(doc: Doc, treatments: TreatmentView[]): void {
  if (treatments.length === 0) return;
  heading(doc, 'Treatments');
  for (const treatment of treatments) {
    ensureSpace(doc, 40);
    write(doc, `${treatment.treatedOn} — ${treatment.action}`, { style: 'semibold' });
    const detail = [
      treatment.treatedBy ? `by ${treatment.treatedBy.name}` : null,
      treatment.materials ? `materials: ${treatment.materials}` : null,
      treatment.notes,
    ].filter(Boolean);
    if (detail.length) write(doc, detail.join('; '), { width: doc.page.width - 2 * MARGIN });
    doc.moveDown(0.3);
  }
}

const signed = (value: number, digits = 2) => signedFixed(value, digits);

function toneSection(doc: Doc, tone: ToneReportData | null): void {
  heading(doc, 'Tone');
  if (!tone) {
    write(doc, 'No tone checks are recorded for this print.', { style: 'italic', color: FAINT });
    return;
  }
  write(
    doc,
    `Status: ${tone.status}. Latest check ${tone.latestOn} against the baseline of ${tone.baselineOn} (CIELAB, D50).`,
  );
  doc.moveDown(0.4);
  const columns = ['Patch', 'ΔL*', 'Δa*', 'Δb*', 'ΔE00', 'Density', 'ΔD'];
  const widths = [110, 60, 60, 60, 60, 60, 60];
  const row = (cells: string[], style: 'regular' | 'semibold') => {
    ensureSpace(doc, 16);
    const y = doc.y;
    let x = MARGIN;
    cells.forEach((cell, index) => {
      writeCell(doc, cell, { style, x, y, width: widths[index]!, align: index ? 'right' : 'left' });
      x += widths[index]!;
    });
    doc.x = MARGIN;
    doc.y = y + 15;
  };
  row(columns, 'semibold');
  for (const patch of tone.comparison) {
    row(
      [
        patch.patch,
        signed(patch.dL),
        signed(patch.da),
        signed(patch.db),
        patch.dE00.toFixed(2),
        patch.density == null ? '—' : patch.density.toFixed(DENSITY_DIGITS),
        patch.dDensity == null ? '—' : signed(patch.dDensity, DENSITY_DIGITS),
      ],
      'regular',
    );
  }
  doc.moveDown(0.8);
  ensureSpace(doc, 230);
  write(doc, 'Trend: ΔE00 against the baseline at each check', { style: 'semibold' });
  drawToneChart(doc, tone, {
    x: MARGIN,
    y: doc.y + 14,
    width: doc.page.width - 2 * MARGIN,
    height: 200,
  });
}

/** "Page n of N", the date and who produced it, on every page. */
function footers(doc: Doc, input: ReportInput): void {
  const range = doc.bufferedPageRange();
  for (let index = 0; index < range.count; index += 1) {
    doc.switchToPage(range.start + index);
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    const y = doc.page.height - MARGIN + 6;
    write(
      doc,
      `${input.print.accessionNumber} · produced ${input.producedAt.toISOString().slice(0, 10)} by ${input.producedBy.name} · Printwarden`,
      { size: 8.5, color: FAINT, lineBreak: false },
      { x: MARGIN, y },
    );
    write(
      doc,
      `Page ${index + 1} of ${range.count}`,
      { size: 8.5, color: FAINT, width: 120, align: 'right', lineBreak: false },
      { x: doc.page.width - MARGIN - 120, y },
    );
    doc.page.margins.bottom = bottom;
  }
}
