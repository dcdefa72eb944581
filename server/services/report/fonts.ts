import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';

/**
 * EB Garamond for the PDF, from the app's own @fontsource files. Each file is one
 * unicode-range subset, so a run of text is split by subset (Δ lives only in `greek`);
 * fontkit drops a missing glyph silently. We use `.woff`: the `.woff2` files crash
 * fontkit's subsetter on some glyphs (stack.md, pitfall 15).
 */
const packageDir = dirname(
  createRequire(import.meta.url).resolve('@fontsource/eb-garamond/package.json'),
);

export type FontStyle = 'regular' | 'semibold' | 'italic';
const STYLE_FILES: Record<FontStyle, { weight: number; italic: boolean }> = {
  regular: { weight: 400, italic: false },
  semibold: { weight: 600, italic: false },
  italic: { weight: 400, italic: true },
};
const SUBSETS = ['latin', 'latin-ext', 'greek'] as const;

interface Subset {
  name: string;
  file: string;
  ranges: Array<[number, number]>;
}

/** `U+0370-0377,U+038C` → [[0x370, 0x377], [0x38c, 0x38c]]. */
export function parseUnicodeRange(css: string): Array<[number, number]> {
  const match = /unicode-range:\s*([^;]+);/.exec(css);
  if (!match) return [];
  return match[1]!.split(',').map((part) => {
    const [from, to] = part.trim().replace(/^U\+/i, '').split('-');
    return [parseInt(from!, 16), parseInt(to ?? from!, 16)];
  });
}

function subsetsOf(style: FontStyle): Subset[] {
  const { weight, italic } = STYLE_FILES[style];
  const variant = `${weight}-${italic ? 'italic' : 'normal'}`;
  // The per-weight stylesheet holds one @font-face per subset, each with its unicode-range.
  const css = readFileSync(join(packageDir, `${weight}${italic ? '-italic' : ''}.css`), 'utf8');
  return SUBSETS.map((subset) => {
    const marker = `/* eb-garamond-${subset}-${variant} */`;
    const start = css.indexOf(marker);
    if (start < 0) throw new Error(`EB Garamond: no ${subset} subset for ${variant}`);
    const block = css.slice(start, css.indexOf('}', start));
    return {
      name: `garamond-${style}-${subset}`,
      file: join(packageDir, 'files', `eb-garamond-${subset}-${variant}.woff`),
      ranges: parseUnicodeRange(block),
    };
  });
}

let cache: Record<FontStyle, Subset[]> | undefined;
function allSubsets(): Record<FontStyle, Subset[]> {
  cache ??= {
    regular: subsetsOf('regular'),
    semibold: subsetsOf('semibold'),
    italic: subsetsOf('italic'),
  };
  return cache;
}

/** The font files to register with pdfkit, by name. */
export function fontFiles(): Array<{ name: string; file: string }> {
  return Object.values(allSubsets()).flatMap((list) =>
    list.map(({ name, file }) => ({ name, file })),
  );
}

/** Splits text into runs, each set in the first subset that holds its characters (latin first). */
export function runsBySubset(
  text: string,
  style: FontStyle,
): Array<{ font: string; text: string }> {
  const subsets = allSubsets()[style];
  const fontFor = (codePoint: number) =>
    (
      subsets.find((subset) =>
        subset.ranges.some(([from, to]) => codePoint >= from && codePoint <= to),
      ) ?? subsets[0]!
    ).name;
  const runs: Array<{ font: string; text: string }> = [];
  for (const character of text) {
    const font = fontFor(character.codePointAt(0)!);
    const last = runs.at(-1);
    if (last && last.font === font) last.text += character;
    else runs.push({ font, text: character });
  }
  return runs;
}
