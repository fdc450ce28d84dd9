import type { LayoutShape, PanelLayout } from './layout-panel';
import type { Point } from './types';

/** A label's box, centred on (x, y), in drawing millimetres with y up. */
export type LabelBox = { x: number; y: number; width: number; height: number };
export type PlacedLabel = LabelBox & { text: string; size: number };

// Generous for digits, dots and primes in the app's sans face, so a box is never smaller than the
// text drawn in it; text is drawn with a central baseline so the box is centred on (x, y).
const CHAR_WIDTH_EM = 0.66;
const LINE_HEIGHT_EM = 1.3;

/** Type sizes that grow with the drawing, so marks stay readable when a large panel is drawn small. */
export function labelSizes(bounds: PanelLayout['bounds']): { mark: number; dimension: number } {
  const extent = Math.max(bounds.maxX - bounds.minX, bounds.maxY - bounds.minY);
  return { mark: Math.max(60, extent / 32), dimension: Math.max(70, extent / 24) };
}

export function labelBox(text: string, size: number, x: number, y: number): PlacedLabel {
  return { text, size, x, y, width: text.length * CHAR_WIDTH_EM * size, height: LINE_HEIGHT_EM * size };
}

export function boxesOverlap(a: LabelBox, b: LabelBox): boolean {
  return Math.abs(a.x - b.x) * 2 < a.width + b.width && Math.abs(a.y - b.y) * 2 < a.height + b.height;
}

// Tried in turn along a piece's length: the middle first, then further out on either side.
const ALONG = [0.5, 0.35, 0.65, 0.2, 0.8, 0.1, 0.9, 0.42, 0.58, 0.27, 0.73];
const SHRINK = [1, 0.8, 0.65];

/** Where a line across x (or y when `vertical`) enters and leaves the outline: the piece's middle there. */
function middleAcross(points: Point[], at: number, vertical: boolean): number | null {
  const hits: number[] = [];
  for (let k = 0; k < points.length; k++) {
    const [p, q] = [points[k], points[(k + 1) % points.length]];
    const [pa, qa, pb, qb] = vertical ? [p.y, q.y, p.x, q.x] : [p.x, q.x, p.y, q.y];
    if ((pa <= at && at <= qa) || (qa <= at && at <= pa))
      hits.push(pa === qa ? (pb + qb) / 2 : pb + ((at - pa) * (qb - pb)) / (qa - pa));
  }
  return hits.length ? (Math.min(...hits) + Math.max(...hits)) / 2 : null;
}

/** Spots on the piece's middle line, middle first; then, for a crowded piece, spots just beside it. */
function candidates(shape: LayoutShape, size: number): { on: Point[]; beside: Point[] } {
  const xs = shape.points.map((p) => p.x);
  const ys = shape.points.map((p) => p.y);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const vertical = y1 - y0 > x1 - x0;
  const on = ALONG.flatMap((f) => {
    const at = vertical ? y0 + f * (y1 - y0) : x0 + f * (x1 - x0);
    const across = middleAcross(shape.points, at, vertical);
    if (across === null) return [];
    return [vertical ? { x: across, y: at } : { x: at, y: across }];
  });
  const beside = on.flatMap((p) =>
    [1.6, -1.6, 3.2, -3.2].map((k) =>
      vertical ? { x: p.x + k * size, y: p.y } : { x: p.x, y: p.y + k * size },
    ),
  );
  return { on, beside };
}

/** A dimension's text: square to its line at the middle, on the side it is offset to, clear of the line. */
function dimensionCandidates(d: PanelLayout['dimensions'][number], size: number): Point[] {
  const len = Math.hypot(d.to.x - d.from.x, d.to.y - d.from.y) || 1;
  const [ux, uy] = [(d.to.x - d.from.x) / len, (d.to.y - d.from.y) / len];
  const [nx, ny] = [-uy, ux];
  // Horizontal lines carry their text above; vertical ones centre it on the line (it reads across).
  const lift = Math.abs(uy) < 0.5 ? 0.75 * size : 0;
  return [0.5, 0.3, 0.7].flatMap((t) =>
    [0, 1.4, -1.4, 2.8].map((k) => {
      const base = { x: d.from.x + ux * len * t + nx * d.offset, y: d.from.y + uy * len * t + ny * d.offset };
      return { x: base.x, y: base.y + lift + k * size * (Math.abs(uy) < 0.5 ? 1 : 0) };
    }),
  );
}

/**
 * Places every dimension text and piece mark so that no two boxes overlap: dimensions first, then
 * each mark at the first free spot along its piece, in smaller type when a piece is crowded.
 */
export function placeDrawingLabels(
  layout: Pick<PanelLayout, 'shapes' | 'dimensions'>,
  sizes: { mark: number; dimension: number },
): { dimensions: PlacedLabel[]; marks: (PlacedLabel & { shapeIndex: number })[] } {
  const placed: PlacedLabel[] = [];
  // The first spot, pass by pass, where the text's box touches no box placed before it.
  const firstFree = (text: string, size: number, passes: { spots: Point[]; scales: number[] }[]) => {
    for (const { spots, scales } of passes)
      for (const scale of scales)
        for (const p of spots) {
          const box = labelBox(text, size * scale, p.x, p.y);
          if (!placed.some((other) => boxesOverlap(box, other))) return box;
        }
    const first = passes[0].spots[0];
    return labelBox(text, size * SHRINK.at(-1)!, first.x, first.y);
  };
  const dimensions = layout.dimensions.map((d) => {
    const spots = dimensionCandidates(d, sizes.dimension);
    const box = firstFree(d.text, sizes.dimension, [{ spots, scales: SHRINK }]);
    placed.push(box);
    return box;
  });
  const marks: (PlacedLabel & { shapeIndex: number })[] = [];
  layout.shapes.forEach((shape, shapeIndex) => {
    if (!shape.mark || shape.points.length === 0) return;
    const { on, beside } = candidates(shape, sizes.mark);
    if (on.length === 0) return;
    const box = firstFree(shape.mark, sizes.mark, [
      { spots: on, scales: SHRINK },
      { spots: beside, scales: SHRINK },
    ]);
    placed.push(box);
    marks.push({ ...box, shapeIndex });
  });
  return { dimensions, marks };
}
