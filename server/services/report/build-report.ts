import type { User } from '../../models';
import type { AppContext } from '../../context';
import { presentConditionReport, presentTreatment } from '../../presenters/condition';
import { presentPrint } from '../../presenters/print';
import { listConditionReports } from '../condition/condition-reports';
import { listTreatments } from '../condition/treatments';
import { readPrint } from '../prints/read-print';
import { renderReport, type ReportImage } from './render-report';
import { loadAssetImage, loadRecto } from './report-images';
import { readToneForReport } from './tone-source';

/** Gathers the record, latest condition report, treatments, tone data and images, and renders the PDF. */
export async function buildPrintReport(
  ctx: AppContext,
  printId: number,
  user: User,
): Promise<{ pdf: Buffer; accessionNumber: string }> {
  const { print, locationPath } = await readPrint(ctx.sequelize, printId);
  const view = presentPrint(print, user.role, locationPath);
  const [reports, treatments, tone, recto] = await Promise.all([
    listConditionReports(printId),
    listTreatments(printId),
    readToneForReport(printId),
    loadRecto(ctx, printId),
  ]);
  const latest = reports[0] ? presentConditionReport(reports[0]) : null;
  const conditionImages: ReportImage[] = [];
  for (const attached of latest?.images ?? []) {
    const image = await loadAssetImage(ctx, attached.assetId);
    if (image) conditionImages.push({ ...image, area: attached.area, caption: attached.caption });
  }
  const pdf = await renderReport({
    print: view,
    producedBy: { name: user.name, role: user.role },
    producedAt: new Date(),
    condition: latest,
    treatments: treatments.map(presentTreatment),
    tone,
    recto,
    conditionImages,
  });
  return { pdf, accessionNumber: print.accessionNumber };
}
