import { describe, expect, it } from 'vitest';
import {
  LABEL_SHEETS,
  POINTS_PER_MM,
  labelBoxes,
  labelSheet,
} from '../../../shared/domain/label-sheets';

describe('label sheets', () => {
  it('fills each sheet edge to edge: margins either side equal, nothing off the page', () => {
    for (const sheet of LABEL_SHEETS) {
      const lastRight =
        sheet.leftMarginMm + (sheet.columns - 1) * sheet.horizontalPitchMm + sheet.labelWidthMm;
      const lastBottom =
        sheet.topMarginMm + (sheet.rows - 1) * sheet.verticalPitchMm + sheet.labelHeightMm;
      // The right margin equals the left and the bottom the top: symmetrical die-cut sheets.
      expect(sheet.pageWidthMm - lastRight).toBeCloseTo(sheet.leftMarginMm, 6);
      expect(sheet.pageHeightMm - lastBottom).toBeCloseTo(sheet.topMarginMm, 6);
    }
  });

  it('knows the paper: A4 210 × 297 mm (ISO 216), Letter 8.5 × 11 in = 215.9 × 279.4 mm', () => {
    expect(labelSheet('a4-3x8')).toMatchObject({ pageWidthMm: 210, pageHeightMm: 297 });
    // NIST Handbook 44: 1 in = 25.4 mm exactly.
    expect(labelSheet('letter-3x10').pageWidthMm).toBeCloseTo(215.9, 9);
    expect(labelSheet('letter-3x10').pageHeightMm).toBeCloseTo(279.4, 9);
    // A4 in PDF points (72 to the inch): 595.28 × 841.89, as PDF writers give it.
    expect(210 * POINTS_PER_MM).toBeCloseTo(595.28, 2);
    expect(297 * POINTS_PER_MM).toBeCloseTo(841.89, 2);
  });

  it('numbers labels row by row, after the used ones, over as many pages as needed', () => {
    const sheet = labelSheet('a4-3x8');
    const boxes = labelBoxes(sheet, 26, 2);
    expect(boxes[0]).toEqual({ page: 0, x: 140, y: 0.5, width: 70, height: 37 });
    expect(boxes[1]).toEqual({ page: 0, x: 0, y: 37.5, width: 70, height: 37 });
    // 2 used + 22 printed fill the first page's 24; the 23rd starts page two at the top left.
    expect(boxes[22]).toEqual({ page: 1, x: 0, y: 0.5, width: 70, height: 37 });
    expect(boxes).toHaveLength(26);
  });
});
