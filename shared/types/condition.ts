import type { ConditionGrade, TreatmentImageStage } from '../domain/condition';
import type { ImageArea, Observation } from '../schemas/condition';

/** An image attached to a report or treatment, with its URLs when the asset still exists. */
export interface AttachedImageView {
  assetId: number;
  area: ImageArea | null;
  caption: string | null;
  stage: TreatmentImageStage | null;
  urls: { web: string; thumbnail: string } | null;
}

export interface ConditionReportView {
  id: number;
  printId: number;
  reportedOn: string;
  reportedBy: { id: number; name: string } | null;
  grade: ConditionGrade | null;
  observations: Observation[];
  notes: string | null;
  recommendation: string | null;
  environment: { temperatureC: number | null; rh: number | null } | null;
  images: AttachedImageView[];
  createdAt: string;
}

export interface TreatmentView {
  id: number;
  printId: number;
  treatedOn: string;
  treatedBy: { id: number; name: string } | null;
  action: string;
  materials: string | null;
  notes: string | null;
  images: AttachedImageView[];
  createdAt: string;
}
