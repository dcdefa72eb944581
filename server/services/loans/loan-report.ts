import PDFDocument from 'pdfkit';
import { formatNumber } from '../../../shared/domain/format';
import { LIGHT_CAUTION } from '../../../shared/domain/light/settings';
import type { AppContext } from '../../context';
import { reportGrades } from '../../repositories/loan-repository';
import { FAINT, GALL, INK, registerFonts, write } from '../report/pdf-text';
import { loadRecto } from '../report/report-images';
import { readLoan } from './loans';

const MARGIN = 50;
const THUMB = 64;

const size = (w: number | null, h: number | null) =>
  w && h ? `${formatNumber(w)} × ${formatNumber(h)} mm` : 'size not recorded';

/** The courier's and borrower's sheet: conditions, then each print with its thumbnail. */
export async function buildLoanReport(
  ctx: AppContext,
  id: number,
): Promise<{ pdf: Buffer; title: string }> {
  const { loan, prints } = await readLoan(ctx.sequelize, id);
  const grades = await reportGrades(
    ctx.sequelize,
    prints.flatMap((print) => (print.departure_report_id ? [print.departure_report_id] : [])),
  );
  const images = await Promise.all(prints.map((print) => loadRecto(ctx, print.print_id)));
  const doc = new PDFDocument({
    size: 'A4',
    margin: MARGIN,
    info: { Title: loan.title, Creator: 'Printwarden' },
  });
  registerFonts(doc);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  write(doc, loan.kind === 'loan' ? 'LOAN — COURIER AND BORROWER SHEET' : 'EXHIBITION SHEET', {
    size: 9,
    color: GALL,
    characterSpacing: 1.5,
  });
  write(doc, loan.title, { style: 'semibold', size: 20 });
  write(doc, `${loan.venue} · ${loan.starts_on} to ${loan.ends_on}`, { size: 11, color: FAINT });
  if (loan.contact) write(doc, `Contact: ${loan.contact}`, { size: 10 });
  doc.moveDown(0.6);
  write(doc, 'Agreed conditions', { style: 'semibold', size: 13 });
  const lines = [
    `Illuminance at most ${formatNumber(loan.max_lux)} lx, ${formatNumber(loan.hours_per_day)} hours a day`,
    loan.max_uv === null ? null : `Ultraviolet at most ${formatNumber(loan.max_uv)} µW/lm`,
    loan.temperature_min === null
      ? null
      : `Temperature ${formatNumber(loan.temperature_min)}–${formatNumber(loan.temperature_max ?? loan.temperature_min)} °C`,
    loan.humidity_min === null
      ? null
      : `Relative humidity ${formatNumber(loan.humidity_min)}–${formatNumber(loan.humidity_max ?? loan.humidity_min)} %`,
    'No flash photography',
    loan.conditions_signed_on
      ? `Signed by ${loan.signer_name ?? 'a conservator'} on ${loan.conditions_signed_on}`
      : 'Not yet signed by a conservator',
  ];
  for (const line of lines) if (line) write(doc, `• ${line}`, { size: 10.5 });
  write(doc, LIGHT_CAUTION, { size: 9, color: FAINT });
  doc.moveDown(0.6);
  write(doc, `Prints (${prints.length})`, { style: 'semibold', size: 13 });
  prints.forEach((print, index) => {
    if (doc.y + THUMB + 10 > doc.page.height - MARGIN) doc.addPage();
    const top = doc.y + 4;
    const image = images[index];
    if (image) doc.image(image.bytes, MARGIN, top, { fit: [THUMB, THUMB] });
    else doc.rect(MARGIN, top, THUMB, THUMB).strokeColor(FAINT).stroke();
    const x = MARGIN + THUMB + 12;
    const grade = print.departure_report_id ? grades.get(print.departure_report_id) : undefined;
    write(
      doc,
      `${print.accession_number}  ${print.title}`,
      { style: 'semibold', size: 10.5, color: INK },
      { x, y: top },
    );
    write(doc, `${print.process} · sheet ${size(print.sheet_width_mm, print.sheet_height_mm)}`, {
      size: 9.5,
    });
    write(
      doc,
      grade === undefined
        ? 'Condition at departure: no report linked yet'
        : `Condition at departure: ${grade ?? 'not graded'}`,
      { size: 9.5, color: FAINT },
    );
    doc.x = MARGIN;
    doc.y = top + THUMB + 6;
  });
  doc.end();
  return { pdf: await done, title: loan.title };
}
