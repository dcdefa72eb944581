import type PDFDocument from 'pdfkit';
import { FAINT, INK, RULE, write } from './pdf-text';
import type { ToneReportData } from './tone-source';

type Doc = InstanceType<typeof PDFDocument>;

/** One colour per patch, dark enough to tell apart in greyscale too. */
const PATCH_COLOURS = ['#7a4a2a', '#2f5d7c', '#5c6b2e', '#7c2f5d', '#444444'];

const dayOf = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / 86_400_000;

/** A line chart of ΔE00 against the baseline over time, per patch, with the noticeable threshold dashed. */
export function drawToneChart(
  doc: Doc,
  tone: ToneReportData,
  box: { x: number; y: number; width: number; height: number },
): void {
  const points = tone.trend.flatMap((patch) => patch.series);
  if (points.length === 0) return;
  const days = points.map((point) => dayOf(point.checkedOn));
  const first = Math.min(...days);
  const span = Math.max(Math.max(...days) - first, 1);
  const top = Math.max(tone.noticeableDE00 * 1.25, ...points.map((point) => point.dE00), 0.5);
  const plot = { x: box.x + 34, y: box.y + 6, width: box.width - 44, height: box.height - 40 };
  const px = (iso: string) => plot.x + ((dayOf(iso) - first) / span) * plot.width;
  const py = (value: number) => plot.y + plot.height - (value / top) * plot.height;

  doc.save().lineWidth(0.5).strokeColor(RULE);
  doc.rect(plot.x, plot.y, plot.width, plot.height).stroke();
  for (const tick of [0, top / 2, top]) {
    write(
      doc,
      tick.toFixed(1),
      { size: 8, color: FAINT, width: 28, align: 'right' },
      { x: box.x, y: py(tick) - 4 },
    );
  }
  write(doc, 'ΔE00', { size: 8, color: FAINT }, { x: box.x, y: plot.y - 12 });
  const firstDate = points.reduce((a, b) => (a.checkedOn < b.checkedOn ? a : b)).checkedOn;
  const lastDate = points.reduce((a, b) => (a.checkedOn > b.checkedOn ? a : b)).checkedOn;
  write(doc, firstDate, { size: 8, color: FAINT }, { x: plot.x, y: plot.y + plot.height + 3 });
  write(
    doc,
    lastDate,
    { size: 8, color: FAINT, width: 80, align: 'right' },
    { x: plot.x + plot.width - 80, y: plot.y + plot.height + 3 },
  );

  doc.lineWidth(0.75).strokeColor(FAINT).dash(3, { space: 3 });
  doc
    .moveTo(plot.x, py(tone.noticeableDE00))
    .lineTo(plot.x + plot.width, py(tone.noticeableDE00))
    .stroke();
  doc.undash();

  tone.trend.forEach((patch, index) => {
    const colour = PATCH_COLOURS[index % PATCH_COLOURS.length]!;
    doc.lineWidth(1.2).strokeColor(colour).fillColor(colour);
    patch.series.forEach((point, n) => {
      if (n === 0) doc.moveTo(px(point.checkedOn), py(point.dE00));
      else doc.lineTo(px(point.checkedOn), py(point.dE00));
    });
    if (patch.series.length > 1) doc.stroke();
    for (const point of patch.series) doc.circle(px(point.checkedOn), py(point.dE00), 1.8).fill();
  });
  doc.restore();

  let legendX = plot.x;
  const legendY = plot.y + plot.height + 16;
  tone.trend.forEach((patch, index) => {
    doc
      .save()
      .rect(legendX, legendY + 3, 8, 3)
      .fill(PATCH_COLOURS[index % PATCH_COLOURS.length]!)
      .restore();
    write(
      doc,
      patch.patch,
      { size: 8.5, color: INK, lineBreak: false },
      { x: legendX + 11, y: legendY },
    );
    legendX += 16 + doc.widthOfString(patch.patch) + 12;
  });
  write(
    doc,
    `- - noticeable (ΔE00 ${tone.noticeableDE00})`,
    { size: 8.5, color: FAINT, lineBreak: false },
    { x: legendX, y: legendY },
  );
  doc.x = box.x;
  doc.y = box.y + box.height;
}
