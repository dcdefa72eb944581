import type {
  AttachedImageView,
  ConditionReportView,
  TreatmentView,
} from '../../shared/types/condition';
import type { ConditionReport, Treatment, User } from '../models';
import { attachedImageUrls } from '../services/condition/attached-images';

const person = (user: User | null | undefined) => (user ? { id: user.id, name: user.name } : null);

function image(
  assetId: number,
  extra: Partial<Pick<AttachedImageView, 'area' | 'caption' | 'stage'>>,
): AttachedImageView {
  return {
    assetId,
    area: extra.area ?? null,
    caption: extra.caption ?? null,
    stage: extra.stage ?? null,
    urls: attachedImageUrls(assetId),
  };
}

export function presentConditionReport(report: ConditionReport): ConditionReportView {
  const hasEnvironment = report.temperatureC !== null || report.relativeHumidity !== null;
  return {
    id: report.id,
    printId: report.printId,
    reportedOn: report.reportedOn,
    reportedBy: person(report.reporter),
    grade: report.grade,
    observations: report.observations,
    notes: report.notes,
    recommendation: report.recommendation,
    environment: hasEnvironment
      ? { temperatureC: report.temperatureC, rh: report.relativeHumidity }
      : null,
    images: report.images.map((stored) => image(stored.assetId, stored)),
    createdAt: report.createdAt.toISOString(),
  };
}

export function presentTreatment(treatment: Treatment): TreatmentView {
  return {
    id: treatment.id,
    printId: treatment.printId,
    treatedOn: treatment.treatedOn,
    treatedBy: person(treatment.treater),
    action: treatment.action,
    materials: treatment.materials,
    notes: treatment.notes,
    images: treatment.images.map((stored) => image(stored.assetId, stored)),
    createdAt: treatment.createdAt.toISOString(),
  };
}
