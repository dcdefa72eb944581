import { wcagContrast } from 'culori';
import { describe, expect, it } from 'vitest';
import config from '../../../tailwind.config';

// WCAG 2.2 success criterion 1.4.3 asks 4.5:1 for body text. The ratio is computed by
// culori's `wcagContrast`, which implements WCAG's relative-luminance formula. Browser
// tests run axe's contrast rule only in their page sweeps (see `expectAccessible`), so
// this check covers every pairing of the palette the screens use, on any page.
const colours = config.theme.extend.colors;

const TEXT = {
  ink: colours.ink.DEFAULT,
  'ink-soft': colours.ink.soft,
  'ink-faint': colours.ink.faint,
  gall: colours.gall.DEFAULT,
  'gall-dark': colours.gall.dark,
  alert: colours.alert.DEFAULT,
  ok: colours.ok.DEFAULT,
};
const LIGHT_SURFACES = {
  paper: colours.paper.DEFAULT,
  'paper-deep': colours.paper.deep,
  white: '#ffffff',
  'gall-light': colours.gall.light,
  'alert-light': colours.alert.light,
  'ok-light': colours.ok.light,
};
const DARK_SURFACES = {
  ink: colours.ink.DEFAULT,
  gall: colours.gall.DEFAULT,
  'gall-dark': colours.gall.dark,
  alert: colours.alert.DEFAULT,
  ok: colours.ok.DEFAULT,
};

describe('the palette', () => {
  for (const [text, foreground] of Object.entries(TEXT)) {
    it(`text-${text} reads at 4.5:1 or more on every light surface`, () => {
      for (const [surface, background] of Object.entries(LIGHT_SURFACES)) {
        expect(wcagContrast(foreground, background), `on ${surface}`).toBeGreaterThanOrEqual(4.5);
      }
    });
  }

  it('paper-coloured text reads on every dark surface', () => {
    for (const [surface, background] of Object.entries(DARK_SURFACES)) {
      expect(
        wcagContrast(colours.paper.DEFAULT, background),
        `on ${surface}`,
      ).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('the hover surface, paper-edge, carries only full ink', () => {
    expect(wcagContrast(colours.ink.DEFAULT, colours.paper.edge)).toBeGreaterThanOrEqual(4.5);
    // Why only full ink there: the faint ink falls short of 4.5:1 on it.
    expect(wcagContrast(colours.ink.faint, colours.paper.edge)).toBeLessThan(4.5);
  });

  it('agrees with the worked examples of the formula', () => {
    // WCAG 2.2's definition of contrast ratio: black on white is 21:1, a colour on itself 1:1.
    expect(wcagContrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(wcagContrast('#777777', '#777777')).toBeCloseTo(1, 5);
  });
});
