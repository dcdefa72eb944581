import { linearSrgbToLabD50, linearToSrgb, srgbToLinear } from '../../../shared/domain/srgb-lab';
import type { SampleRegionInput } from '../../../shared/schemas/asset';
import type { SampleResult } from '../../../shared/types/asset';
import { problems } from '../../middleware/problem';
import type { Asset } from '../../models';
import type { ObjectStorage } from '../storage/storage';
import { srgbPipeline } from './to-srgb';

/** Regions larger than this are averaged from a reduced copy (area resampling). */
const MAX_SAMPLE_PIXELS = 4_000_000;
const round = (value: number, places: number) => Math.round(value * 10 ** places) / 10 ** places;

/**
 * The mean colour of a rectangle of the original: decoded, oriented and converted to sRGB
 * through its embedded profile at 16 bits per channel, averaged in linear light (as an
 * instrument's aperture averages reflected light), then given as sRGB (0–255) and CIELAB D50.
 */
export async function sampleRegion(
  storage: ObjectStorage,
  asset: Asset,
  region: SampleRegionInput,
): Promise<SampleResult> {
  if (region.x + region.width > asset.width || region.y + region.height > asset.height) {
    throw problems.invalid([
      {
        path: 'width',
        message: `The region must lie inside the image (${asset.width} × ${asset.height} px)`,
      },
    ]);
  }
  const input = await storage.localPath(asset.storageKey);
  const area = region.width * region.height;
  const scale = area > MAX_SAMPLE_PIXELS ? Math.sqrt(MAX_SAMPLE_PIXELS / area) : 1;
  let pipeline = srgbPipeline(input, asset)
    .rotate()
    .extract({ left: region.x, top: region.y, width: region.width, height: region.height });
  if (scale < 1) {
    pipeline = pipeline.resize(
      Math.max(1, Math.round(region.width * scale)),
      Math.max(1, Math.round(region.height * scale)),
      { kernel: 'linear' },
    );
  }
  // sharp widens 8-bit samples to 16 bits by shifting (×256), not by ×257; read each
  // depth as it is and scale by its own maximum.
  const deep = asset.bitDepth > 8;
  const { data, info } = await pipeline
    .removeAlpha()
    .toColourspace(deep ? 'rgb16' : 'srgb')
    .raw({ depth: deep ? 'ushort' : 'uchar' })
    .toBuffer({ resolveWithObject: true });
  const samples = deep
    ? new Uint16Array(data.buffer, data.byteOffset, data.byteLength / 2)
    : new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
  const channels = info.channels;
  const pixels = samples.length / channels;
  // A lookup of the decoding for every code keeps the loop to additions.
  const sums = [0, 0, 0];
  const decode = linearTable(deep ? 65535 : 255);
  for (let i = 0; i < samples.length; i += channels) {
    sums[0]! += decode[samples[i]!]!;
    sums[1]! += decode[samples[i + 1]!]!;
    sums[2]! += decode[samples[i + 2]!]!;
  }
  const linear = sums.map((sum) => sum / pixels) as [number, number, number];
  const lab = linearSrgbToLabD50(linear);
  const [r, g, b] = linear.map((value) => round(linearToSrgb(value) * 255, 2)) as [
    number,
    number,
    number,
  ];
  return {
    rgb: { r, g, b },
    lab: { L: round(lab.L, 2), a: round(lab.a, 2), b: round(lab.b, 2) },
    region,
    pixels: area,
  };
}

const tables = new Map<number, Float64Array>();
function linearTable(max: number): Float64Array {
  let table = tables.get(max);
  if (!table) {
    table = new Float64Array(max + 1);
    for (let code = 0; code <= max; code += 1) table[code] = srgbToLinear(code / max);
    tables.set(max, table);
  }
  return table;
}
