import type { AssetStatus, AssetView, FixityResult } from '../domain/asset-views';

/** Capture metadata read from the file (EXIF, TIFF and ICC tags) and its pixels. */
export interface CaptureMetadata {
  /** ISO 8601 date-time as written by the device (no zone unless the file gave one). */
  capturedAt: string | null;
  device: string | null;
  software: string | null;
  /** Pixels per inch, when the file says. */
  dpi: number | null;
  iccProfile: string | null;
  width: number;
  height: number;
  bitDepth: number;
  channels: number;
  format: string;
}

/** An image of a print as the API presents it. */
export interface AssetRecord {
  id: number;
  printId: number;
  view: AssetView;
  originalName: string | null;
  mediaType: string;
  bytes: number;
  sha256: string;
  width: number;
  height: number;
  exif: CaptureMetadata;
  status: AssetStatus;
  /** 0–100: thumbnail, web image, deep-zoom tiles. */
  progress: number;
  error: string | null;
  urls: { original: string; web: string; thumbnail: string; iiif: string };
  fixity: { checkedAt: string; result: FixityResult } | null;
  createdAt: string;
}

export interface SampleResult {
  rgb: { r: number; g: number; b: number };
  lab: { L: number; a: number; b: number };
  region: { x: number; y: number; width: number; height: number };
  pixels: number;
}

export interface FixityCheckView {
  id: number;
  status: 'running' | 'done' | 'failed';
  checked: number;
  total: number;
  mismatches: Array<{ assetId: number; expected: string; actual: string }>;
  missing: number[];
  startedAt: string;
  finishedAt: string | null;
}
