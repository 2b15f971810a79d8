import type { PlantingResults } from '@shared/calc/planting';

type PlacedArbor = PlantingResults['arbors'][number];

/** Paper sizes in mm: the margin round the layout and the strip at the foot that holds the check bar. */
export const SHEET = { margin: 12, foot: 16, marker: 3, font: 3, smallFont: 2.2 } as const;
// The printable area of A4 portrait with the browser's usual margins, for the "will it fit" note.
const A4_PRINTABLE = { width: 180, height: 260 };
// The foot strip needs room for the check bar and its label whatever the layout's size.
const MIN_WIDTH = 70;

interface SheetLayout {
  /** The drawing's box in plate mm (y upwards). */
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
  /** Paper size of the whole sheet in mm. */
  widthMm: number;
  heightMm: number;
  fitsA4: boolean;
}

/**
 * The paper the planting needs at 1:1: every arbor with its pitch circle, the crossing of the datum lines (the
 * origin), the datum point, and a margin.
 */
export function sheetLayout(arbors: PlacedArbor[], datum: { x: number; y: number }): SheetLayout {
  const reach = (a: PlacedArbor) => Math.max(a.pitchRadiusMm ?? 0, SHEET.marker);
  let minX = Math.min(0, datum.x, ...arbors.map((a) => a.x - reach(a)));
  let maxX = Math.max(0, datum.x, ...arbors.map((a) => a.x + reach(a)));
  const minY = Math.min(0, datum.y, ...arbors.map((a) => a.y - reach(a)));
  // Names sit above each arbor; leave them a line of room.
  const maxY = Math.max(0, datum.y, ...arbors.map((a) => a.y + reach(a) + SHEET.font * 2));
  const extra = MIN_WIDTH - (maxX - minX + 2 * SHEET.margin);
  if (extra > 0) {
    minX -= extra / 2;
    maxX += extra / 2;
  }
  const widthMm = maxX - minX + 2 * SHEET.margin;
  const heightMm = maxY - minY + 2 * SHEET.margin + SHEET.foot;
  return {
    minX,
    maxX,
    minY,
    maxY,
    widthMm,
    heightMm,
    fitsA4: widthMm <= A4_PRINTABLE.width && heightMm <= A4_PRINTABLE.height,
  };
}
