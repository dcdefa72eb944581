/**
 * Label sheets by their dimensions, in millimetres. Sheet sizes: A4 is 210 × 297 mm
 * (ISO 216); US Letter is 8.5 × 11 in = 215.9 × 279.4 mm (1 in = 25.4 mm exactly, NIST
 * Handbook 44). Label sizes, margins and pitches are the common die-cut sheets of the
 * stationery trade (common practice; values from memory): check them against the box of
 * labels in hand and pick another layout when they differ.
 */
export interface LabelSheet {
  id: string;
  /** What people call it. */
  label: string;
  pageWidthMm: number;
  pageHeightMm: number;
  columns: number;
  rows: number;
  labelWidthMm: number;
  labelHeightMm: number;
  /** From the page's left edge to the first column. */
  leftMarginMm: number;
  /** From the page's top edge to the first row. */
  topMarginMm: number;
  /** From one column's left edge to the next one's (label width plus the gap). */
  horizontalPitchMm: number;
  /** From one row's top edge to the next one's. */
  verticalPitchMm: number;
}

const INCH_MM = 25.4;

export const LABEL_SHEETS = [
  {
    // 24 labels of 70 × 37 mm edge to edge: 3 × 70 = 210, 8 × 37 = 296 (0.5 mm top and bottom).
    id: 'a4-3x8',
    label: 'A4, 3 × 8 (70 × 37 mm), folders and small boxes',
    pageWidthMm: 210,
    pageHeightMm: 297,
    columns: 3,
    rows: 8,
    labelWidthMm: 70,
    labelHeightMm: 37,
    leftMarginMm: 0,
    topMarginMm: 0.5,
    horizontalPitchMm: 70,
    verticalPitchMm: 37,
  },
  {
    // 30 labels of 1 × 2⅝ in: margins 3/16 in at the sides and ½ in top and bottom, ⅛ in
    // between columns (2 × 3/16 + 3 × 2⅝ + 2 × ⅛ = 8.5 in; 2 × ½ + 10 × 1 = 11 in).
    id: 'letter-3x10',
    label: 'US Letter, 3 × 10 (1 × 2⅝ in), folders',
    pageWidthMm: 8.5 * INCH_MM,
    pageHeightMm: 11 * INCH_MM,
    columns: 3,
    rows: 10,
    labelWidthMm: 2.625 * INCH_MM,
    labelHeightMm: 1 * INCH_MM,
    leftMarginMm: 0.1875 * INCH_MM,
    topMarginMm: 0.5 * INCH_MM,
    horizontalPitchMm: 2.75 * INCH_MM,
    verticalPitchMm: 1 * INCH_MM,
  },
  {
    // 14 labels of 99.1 × 38.1 mm: 4.65 mm sides, 2.5 mm between columns, 15.15 mm top and
    // bottom (2 × 4.65 + 2 × 99.1 + 2.5 = 210; 2 × 15.15 + 7 × 38.1 = 297).
    id: 'a4-2x7',
    label: 'A4, 2 × 7 (99.1 × 38.1 mm), box ends and shelves',
    pageWidthMm: 210,
    pageHeightMm: 297,
    columns: 2,
    rows: 7,
    labelWidthMm: 99.1,
    labelHeightMm: 38.1,
    leftMarginMm: 4.65,
    topMarginMm: 15.15,
    horizontalPitchMm: 101.6,
    verticalPitchMm: 38.1,
  },
] as const satisfies readonly LabelSheet[];

export type LabelLayout = (typeof LABEL_SHEETS)[number]['id'];
export const LABEL_LAYOUTS = LABEL_SHEETS.map((sheet) => sheet.id) as [
  LabelLayout,
  ...LabelLayout[],
];

/** The sheet of a layout id. */
export function labelSheet(id: LabelLayout): LabelSheet {
  return LABEL_SHEETS.find((sheet) => sheet.id === id)!;
}

/** Where one label sits on its page, in millimetres from the top left corner. */
export interface LabelBox {
  page: number;
  x: number;
  y: number;
  width: number;
  height: number;
}

/**
 * The boxes of `count` labels filled row by row, after `skip` labels already used on the
 * first sheet (a partly used sheet goes back in the printer).
 */
export function labelBoxes(sheet: LabelSheet, count: number, skip = 0): LabelBox[] {
  const perPage = sheet.columns * sheet.rows;
  const boxes: LabelBox[] = [];
  for (let n = skip; n < skip + count; n++) {
    const onPage = n % perPage;
    boxes.push({
      page: Math.floor(n / perPage),
      x: sheet.leftMarginMm + (onPage % sheet.columns) * sheet.horizontalPitchMm,
      y: sheet.topMarginMm + Math.floor(onPage / sheet.columns) * sheet.verticalPitchMm,
      width: sheet.labelWidthMm,
      height: sheet.labelHeightMm,
    });
  }
  return boxes;
}

/** PDF points per millimetre: 72 points to the inch, 25.4 mm to the inch. */
export const POINTS_PER_MM = 72 / INCH_MM;
