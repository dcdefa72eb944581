import { randomUUID } from 'node:crypto';
import { existsSync, mkdirSync, renameSync } from 'node:fs';
import { join, resolve } from 'node:path';
import sharp from 'sharp';
import { seededRandom, type Random } from './random';

/**
 * Invented images for the demo prints, drawn with arithmetic and encoded by sharp: warm
 * brown salt-print tones with structure and a full tonal range, brushed coating edges on
 * a paper margin, and versos with pencil marks. Never photographs. Files are cached under
 * `data/demo-images/` so that a second `npm start` does not draw them again.
 */

export interface DemoImage {
  path: string;
  view: 'recto' | 'verso';
  name: string;
}

const CACHE = resolve('data', 'demo-images');

// Salt-print palette (sRGB, chosen by us): deep shadow, midtone, highlight, bare paper.
const SHADOW = [52, 30, 22];
const MID = [142, 92, 60];
const HIGHLIGHT = [226, 206, 176];
const PAPER = [238, 229, 211];

const mix = (a: number[], b: number[], t: number) => a.map((v, i) => v + (b[i]! - v) * t);

/** Shadow → mid → highlight along a 0–1 lightness. */
function tone(lightness: number): number[] {
  const t = Math.min(1, Math.max(0, lightness));
  return t < 0.5 ? mix(SHADOW, MID, t * 2) : mix(MID, HIGHLIGHT, (t - 0.5) * 2);
}

/** A landscape of sky, hills, a waterline and trees: lightness 0–1 per pixel. */
function landscape(rng: Random, width: number, height: number): Float32Array {
  const field = new Float32Array(width * height);
  const horizon = 0.35 + rng.next() * 0.2;
  const water = horizon + 0.2 + rng.next() * 0.15;
  const phase = rng.next() * 6.28;
  const trees = Array.from({ length: rng.int(3, 9) }, () => ({
    x: rng.next(),
    w: 0.005 + rng.next() * 0.02,
    top: horizon - 0.05 - rng.next() * 0.25,
  }));
  for (let y = 0; y < height; y += 1) {
    const v = y / height;
    for (let x = 0; x < width; x += 1) {
      const u = x / width;
      const ridge = horizon + 0.06 * Math.sin(u * 7 + phase) + 0.03 * Math.sin(u * 19 + phase * 2);
      let l: number;
      if (v < ridge) l = 0.95 - v * 0.5;
      else if (v < water) l = 0.25 + 0.25 * Math.sin(u * 40 + v * 30) * Math.sin(u * 3);
      else l = 0.55 + 0.3 * Math.sin(v * 140 + Math.sin(u * 12) * 3) * (1 - (v - water));
      for (const tree of trees) {
        if (Math.abs(u - tree.x) < tree.w * (1 + (v - tree.top) * 2) && v > tree.top && v < water) {
          l = 0.04 + 0.08 * Math.abs(Math.sin(u * 900 + v * 700));
        }
      }
      field[y * width + x] = l;
    }
  }
  return field;
}

/** Recto: the coated image area with brushed, ragged edges on a paper margin. */
function drawRecto(rng: Random, width: number, height: number): Buffer {
  const margin = Math.round(Math.min(width, height) * 0.07);
  const innerW = width - 2 * margin;
  const innerH = height - 2 * margin;
  const field = landscape(rng, innerW, innerH);
  const out = Buffer.alloc(width * height * 3);
  const ragged = Array.from({ length: 64 }, () => rng.next());
  for (let y = 0; y < height; y += 1) {
    for (let x = 0; x < width; x += 1) {
      const grain = (Math.sin(x * 12.9898 + y * 78.233) * 43758.5453) % 1;
      // The brush leaves the coating's edge a few pixels in or out along each side.
      const edge = margin * 0.35 * ragged[((Math.floor((x + y) / 37) % 64) + 64) % 64]!;
      const inside =
        x > margin - edge &&
        x < width - margin + edge &&
        y > margin - edge &&
        y < height - margin + edge;
      let rgb: number[];
      if (inside) {
        const ix = Math.min(innerW - 1, Math.max(0, x - margin));
        const iy = Math.min(innerH - 1, Math.max(0, y - margin));
        rgb = tone(field[iy * innerW + ix]! + grain * 0.04);
      } else {
        rgb = PAPER.map((v) => v + grain * 6);
      }
      out.set(
        rgb.map((v) => Math.max(0, Math.min(255, Math.round(v)))),
        (y * width + x) * 3,
      );
    }
  }
  return out;
}

/**
 * Where `drawVerso` puts its pencil marks, as fractions of the verso (the shape condition
 * reports use for image areas): the accession number written in nine figures along the
 * foot, and the maker's looped initials at the upper right. The demo's marks point here.
 */
export const VERSO_MARK_AREAS = {
  number: { x: 0.1, y: 0.72, width: 0.5, height: 0.16 },
  initials: { x: 0.5, y: 0.13, width: 0.4, height: 0.14 },
} as const;

/** Verso: paper fibres and pencil marks (an inventory number and a signature-like loop). */
export function drawVerso(rng: Random, width: number, height: number): Buffer {
  const out = Buffer.alloc(width * height * 3);
  for (let i = 0; i < width * height; i += 1) {
    const fibre = Math.sin(i * 0.37) * Math.sin(i * 0.0013) * 5 + rng.next() * 4;
    out.set(
      PAPER.map((v) => Math.round(v - 4 + fibre)),
      i * 3,
    );
  }
  const pencil = (x: number, y: number, weight: number) => {
    for (let dy = -weight; dy <= weight; dy += 1) {
      for (let dx = -weight; dx <= weight; dx += 1) {
        const px = Math.round(x + dx);
        const py = Math.round(y + dy);
        if (px < 0 || py < 0 || px >= width || py >= height) continue;
        const at = (py * width + px) * 3;
        const shade = 0.55 + rng.next() * 0.2;
        for (let c = 0; c < 3; c += 1)
          out[at + c] = Math.round(out[at + c]! * shade + 30 * (1 - shade));
      }
    }
  };
  const weight = Math.max(1, Math.round(width / 700));
  // Several short slanted strokes like handwritten figures, then a looping flourish.
  let x = width * 0.12;
  const y = height * 0.85;
  for (let glyph = 0; glyph < 9; glyph += 1) {
    const h = height * (0.03 + rng.next() * 0.02);
    for (let t = 0; t <= 1; t += 0.01) {
      pencil(
        x + Math.sin(t * Math.PI * (1 + (glyph % 3))) * h * 0.3 + t * h * 0.2,
        y - t * h,
        weight,
      );
    }
    x += h * 0.8;
  }
  for (let t = 0; t <= 1; t += 0.0015) {
    const angle = t * Math.PI * 7;
    pencil(
      width * (0.55 + t * 0.3 + Math.cos(angle) * 0.03),
      height * (0.2 + Math.sin(angle) * 0.04),
      weight,
    );
  }
  return out;
}

export interface Plan {
  file: string;
  view: 'recto' | 'verso';
  width: number;
  height: number;
  format: 'jpeg' | 'png' | 'tiff-p3' | 'jpeg-p3';
  seed: number;
}

/** Which prints get which images: rectos for most, versos for about half, a few in Display P3. */
export function demoImagePlan(printCount: number): Array<{ index: number; images: Plan[] }> {
  const rng = seededRandom(6016);
  const plans: Array<{ index: number; images: Plan[] }> = [];
  for (let index = 0; index < printCount; index += 1) {
    if (index % 5 === 4) continue;
    const portrait = rng.chance(0.6);
    const long = index === 0 ? 2000 : rng.int(700, 1400);
    const short = Math.round(long * 0.78);
    const [width, height] = portrait ? [short, long] : [long, short];
    const format =
      index % 9 === 3 ? 'tiff-p3' : index % 7 === 2 ? 'jpeg-p3' : index % 11 === 5 ? 'png' : 'jpeg';
    const images: Plan[] = [
      { file: `print-${index}-recto`, view: 'recto', width, height, format, seed: index * 2 + 1 },
    ];
    if (index % 2 === 0) {
      images.push({
        file: `print-${index}-verso`,
        view: 'verso',
        width: Math.round(width * 0.6),
        height: Math.round(height * 0.6),
        format: 'jpeg',
        seed: index * 2 + 2,
      });
    }
    plans.push({ index, images });
  }
  return plans;
}

const EXTENSION = { jpeg: 'jpg', png: 'png', 'tiff-p3': 'tif', 'jpeg-p3': 'jpg' } as const;

/** The cached file of a planned image, drawn and encoded on first use. */
export async function demoImageFile(plan: Plan): Promise<DemoImage> {
  mkdirSync(CACHE, { recursive: true });
  const name = `${plan.file}.${EXTENSION[plan.format]}`;
  const path = join(CACHE, name);
  if (!existsSync(path)) {
    const rng = seededRandom(plan.seed);
    const pixels =
      plan.view === 'recto'
        ? drawRecto(rng, plan.width, plan.height)
        : drawVerso(rng, plan.width, plan.height);
    let image = sharp(pixels, { raw: { width: plan.width, height: plan.height, channels: 3 } })
      .withExif({
        IFD0: { Make: 'Mill Lane', Model: 'Flatbed scanner (demo)', Software: 'Printwarden demo' },
        IFD2: {
          DateTimeOriginal: `2026:0${1 + (plan.seed % 9)}:1${plan.seed % 10} 10:${10 + (plan.seed % 50)}:00`,
        },
      })
      .withMetadata({ density: 600 });
    // Display P3 files: sharp converts the sRGB drawing into P3 and embeds that profile.
    if (plan.format.endsWith('p3')) image = image.withIccProfile('p3');
    if (plan.format === 'png') image = image.png();
    else if (plan.format === 'tiff-p3') image = image.tiff({ compression: 'lzw' });
    else image = image.jpeg({ quality: 90 });
    // A name of its own per drawing: test files seeding at once draw the same image, and a
    // shared partial name let one rename the other's half-written file into place.
    const partial = `${path}.${randomUUID()}.partial`;
    await image.toFile(partial);
    renameSync(partial, path);
  }
  return { path, view: plan.view, name };
}
