import { roleCan, type Role } from '../../shared/domain/roles';
import type { PrintListItem, PrintView, ProcessingStepView } from '../../shared/types/catalogue';
import { ASSET_VIEWS } from '../../shared/domain/asset-views';
import type { Negative, Paper, Location, SolutionBatch, Source } from '../models';
import type { PrintRecord, PrintStepRecord } from '../repositories/print-record-repository';
import { presentAsset, thumbnailUrl, type PresentableAsset } from './asset';
import { presentRegistrar } from './registrar';

type PrintFields = Omit<
  PrintRecord,
  'paper' | 'negative' | 'location' | 'source' | 'processing' | 'assets'
>;
type PresentableStep = Omit<PrintStepRecord, 'solutionBatch'> & {
  solutionBatch?: Pick<SolutionBatch, 'id' | 'code'> | null;
};

/**
 * What a print's answer is made from: the record read in plain SQL
 * (`repositories/print-record-repository.ts`) or a model instance with its includes.
 */
export type PresentablePrint = PrintFields & {
  paper?: Pick<Paper, 'id' | 'name'> | null;
  negative?: Pick<Negative, 'id' | 'code' | 'kind' | 'format'> | null;
  location?: Pick<Location, 'id' | 'code' | 'name'> | null;
  source?: Pick<Source, 'id' | 'name' | 'kind'> | null;
  processing?: readonly PresentableStep[];
  assets?: readonly PresentableAsset[];
};

/** A row of the prints list. */
export function presentPrintListItem(
  print: Pick<
    PresentablePrint,
    | 'id'
    | 'accessionNumber'
    | 'title'
    | 'maker'
    | 'madeOn'
    | 'process'
    | 'paper'
    | 'fixingMinutes'
    | 'washingMinutes'
    | 'toneStatus'
    | 'hasProcessingRisk'
    | 'status'
    | 'rectoAssetId'
  >,
): PrintListItem {
  return {
    id: print.id,
    accessionNumber: print.accessionNumber,
    title: print.title,
    maker: print.maker,
    madeOn: print.madeOn,
    process: print.process,
    paper: print.paper ? { id: print.paper.id, name: print.paper.name } : null,
    fixingMinutes: print.fixingMinutes,
    washingMinutes: print.washingMinutes,
    toneStatus: print.toneStatus,
    processingRisk: print.hasProcessingRisk,
    status: print.status,
    thumbnailUrl: thumbnailUrl(print.rectoAssetId),
  };
}

export function presentStep(step: PresentableStep): ProcessingStepView {
  return {
    position: step.position,
    stage: step.stage,
    chemical: step.chemical,
    concentrationPercent: step.concentrationPercent,
    solutionBatch: step.solutionBatch
      ? { id: step.solutionBatch.id, code: step.solutionBatch.code }
      : null,
    method: step.method,
    coats: step.coats,
    minutes: step.minutes,
    temperatureC: step.temperatureC,
    lightSource: step.lightSource,
    notes: step.notes,
  };
}

/**
 * The whole record as the given role may see it: storage locations are never sent to
 * viewers. `locationPath` is the full "room > cabinet > drawer" name of the location.
 */
export function presentPrint(
  print: PresentablePrint,
  role: Role,
  locationPath: string | null,
): PrintView {
  const view: PrintView = {
    ...presentPrintListItem(print),
    negative: print.negative
      ? {
          id: print.negative.id,
          code: print.negative.code,
          kind: print.negative.kind,
          format: print.negative.format,
        }
      : null,
    imageWidthMm: print.imageWidthMm,
    imageHeightMm: print.imageHeightMm,
    sheetWidthMm: print.sheetWidthMm,
    sheetHeightMm: print.sheetHeightMm,
    edition: print.edition,
    description: print.description,
    tags: print.tags,
    riskReasons: print.riskReasons,
    processing: [...(print.processing ?? [])]
      .sort((a, b) => a.position - b.position)
      .map(presentStep),
    assets: [...(print.assets ?? [])]
      .sort((a, b) => ASSET_VIEWS.indexOf(a.view) - ASSET_VIEWS.indexOf(b.view) || a.id - b.id)
      .map(presentAsset),
    tone: {
      status: print.toneStatus,
      flags: print.toneFlags ?? [],
      nextCheckDue: print.nextCheckDue,
    },
    ...presentRegistrar(print, role),
    createdAt: print.createdAt.toISOString(),
    updatedAt: print.updatedAt.toISOString(),
    deletedAt: print.deletedAt ? print.deletedAt.toISOString() : null,
    can: {
      edit: roleCan(role, 'prints:write'),
      editCuratorial: roleCan(role, 'prints:edit-curatorial'),
      delete: roleCan(role, 'prints:write'),
    },
  };
  if (roleCan(role, 'locations:read')) {
    view.location = print.location
      ? {
          id: print.location.id,
          code: print.location.code,
          path: locationPath ?? print.location.name,
        }
      : null;
  }
  return view;
}

/** What the audit trail keeps of a print: the full record, without caller-specific parts. */
export function auditSnapshot(
  print: PresentablePrint,
  locationPath: string | null,
): Omit<PrintView, 'can' | 'assets' | 'thumbnailUrl'> {
  // Images keep their own audit events; their progress is not a change to the record.
  const {
    can: _can,
    assets: _assets,
    thumbnailUrl: _thumbnail,
    ...record
  } = presentPrint(print, 'admin', locationPath);
  return record;
}
