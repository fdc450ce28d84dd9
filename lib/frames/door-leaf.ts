import { rectangle, roundAngle, toDegrees } from './geometry';
import type { DoorLeafPanel, FrameSchedulePanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import type { FrameContext, FramePiece, Point } from './types';

export type DoorBrace = {
  /** Centre of the brace's foot, on the hinge side, resting on the lower ledge. */
  start: Point;
  /** Centre of the brace's head, on the latch side, under the upper ledge. */
  end: Point;
  outline: Point[];
  /** Tip to tip, as cut from stock. */
  length: number;
  /** Both ends cut this far off square, in degrees. */
  angle: number;
};

export type DoorLeafGeometry = {
  openingWidth: number;
  openingHeight: number;
  leafWidth: number;
  leafHeight: number;
  boardCount: number;
  ledges: { y0: number; y1: number }[];
  braces: DoorBrace[];
  warnings: string[];
};

/**
 * Ledged and braced leaf seen from the ledged face, x from the left edge, y up from the bottom.
 * The leaf is the opening less the clearances; braces run from low on the hinge side up to the
 * latch side so they are in compression (common practice).
 */
export function getDoorLeafGeometry(
  leaf: DoorLeafPanel,
  panels: FrameSchedulePanel[],
  ctx: FrameContext,
): DoorLeafGeometry | null {
  const opening =
    leaf.openingId !== undefined
      ? panels.find((p) => p.kind === 'opening' && p.id === leaf.openingId)
      : undefined;
  const openingWidth = opening?.kind === 'opening' ? opening.width : leaf.openingWidth;
  const openingHeight = opening?.kind === 'opening' ? opening.height : leaf.openingHeight;
  const ledgeSection = ctx.sections.get(leaf.sectionId);
  if (openingWidth === undefined || openingHeight === undefined || !ledgeSection) return null;
  const leafWidth = openingWidth - leaf.clearanceWidth;
  const leafHeight = openingHeight - leaf.clearanceHeight;
  const warnings: string[] = [];
  const lw = ledgeSection.width; // ledges and braces lie flat on the boards
  const spread = leafHeight - 2 * leaf.ledgeInset - lw;
  const ledges = Array.from({ length: leaf.ledges }, (_, k) => {
    const y0 = leaf.ledgeInset + (k * spread) / (leaf.ledges - 1);
    return { y0, y1: y0 + lw };
  });
  const braces: DoorBrace[] = [];
  for (let k = 0; k + 1 < ledges.length; k++) {
    const brace = fitBrace(leafWidth, leaf.braceInset, ledges[k].y1, ledges[k + 1].y0, lw, leaf.hingeSide);
    if (brace) braces.push(brace);
    else warnings.push(`${leaf.name}: no room for brace ${k + 1} between ledges ${k + 1} and ${k + 2}`);
  }
  return {
    openingWidth,
    openingHeight,
    leafWidth,
    leafHeight,
    boardCount: Math.ceil(leafWidth / leaf.boardCover),
    ledges,
    braces,
    warnings,
  };
}

/** A brace of width w between two ledges, its ends cut level to sit on and under them. */
function fitBrace(
  leafWidth: number,
  inset: number,
  y1: number,
  y2: number,
  w: number,
  hingeSide: 'left' | 'right',
): DoorBrace | null {
  const dx = leafWidth - 2 * inset;
  const dy = y2 - y1;
  if (dy <= 0 || dx <= w) return null;
  // Horizontal travel u of each long edge: u + w·sqrt(u² + dy²)/dy = dx, solved by halving.
  let lo = 0;
  let hi = dx;
  for (let i = 0; i < 60; i++) {
    const u = (lo + hi) / 2;
    if (u + (w * Math.hypot(u, dy)) / dy > dx) hi = u;
    else lo = u;
  }
  const u = lo;
  const foot = dx - u; // width of the level cut at each end
  const mirror = (p: Point): Point => (hingeSide === 'left' ? p : { x: leafWidth - p.x, y: p.y });
  const outline = [
    { x: inset, y: y1 },
    { x: inset + foot, y: y1 },
    { x: leafWidth - inset, y: y2 },
    { x: leafWidth - inset - foot, y: y2 },
  ].map(mirror);
  return {
    start: mirror({ x: inset + foot / 2, y: y1 }),
    end: mirror({ x: leafWidth - inset - foot / 2, y: y2 }),
    outline,
    length: Math.hypot(u, dy) + (w * u) / dy,
    angle: roundAngle(90 - toDegrees(Math.atan2(dy, u))),
  };
}

export function buildDoorLeaf(
  leaf: DoorLeafPanel,
  index: number,
  panels: FrameSchedulePanel[],
  ctx: FrameContext,
): PanelBuild {
  const geometry = getDoorLeafGeometry(leaf, panels, ctx);
  if (!geometry || !ctx.sections.has(leaf.boardSectionId))
    return { pieces: [], warnings: [`${leaf.name}: its opening or a section is unknown, panel skipped`] };
  const at = { panelIndex: index, drawingPanelIndex: index };
  const { leafWidth: W, leafHeight: H } = geometry;
  const pieces: FramePiece[] = [];
  for (let i = 0; i < geometry.boardCount; i++) {
    const x0 = i * leaf.boardCover;
    const x1 = Math.min(W, x0 + leaf.boardCover);
    const note = x1 - x0 < leaf.boardCover ? `rip to ${Math.round(x1 - x0)} mm cover` : undefined;
    pieces.push(
      piece({
        ...at,
        label: `${leaf.name} board`,
        sectionId: leaf.boardSectionId,
        length: H,
        note,
        outline: rectangle(x0, 0, x1, H),
      }),
    );
  }
  for (const l of geometry.ledges)
    pieces.push(
      piece({
        ...at,
        label: `${leaf.name} ledge`,
        sectionId: leaf.sectionId,
        length: W,
        outline: rectangle(0, l.y0, W, l.y1),
      }),
    );
  for (const b of geometry.braces)
    pieces.push(
      piece({
        ...at,
        label: `${leaf.name} brace`,
        sectionId: leaf.sectionId,
        length: b.length,
        angle: b.angle,
        note: 'ends cut parallel',
        outline: b.outline,
      }),
    );
  return { pieces, warnings: geometry.warnings };
}
