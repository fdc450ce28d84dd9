import { buildSchedulePieces } from './build-schedule-pieces';
import { rectangle } from './geometry';
import { groupPieces } from './group-pieces';
import { getFramedWall } from './fit-between';
import { FRAME_STRUCTURE_NOTICE } from './notice';
import type { FrameSchedulePanel } from './panel-schemas';
import { getRoofGeometry } from './roof-frame';
import type { FrameContext, Point } from './types';
import { getWallHeightAt, isStudWall } from './wall-height';

export type LayoutShape = { mark: string | null; label: string; role: 'piece' | 'opening'; points: Point[] };
/** `offset` shifts the dimension line square to it, towards the left of from → to (negative: right). */
export type LayoutDimension = { from: Point; to: Point; offset: number; value: number; text: string };
export type PanelLayout = {
  view: 'elevation' | 'plan';
  title: string;
  bounds: { minX: number; minY: number; maxX: number; maxY: number };
  shapes: LayoutShape[];
  dimensions: LayoutDimension[];
  warnings: string[];
  notice: string;
};

const dimension = (from: Point, to: Point, offset: number): LayoutDimension => {
  const value = Math.round(Math.hypot(to.x - from.x, to.y - from.y));
  return { from, to, offset, value, text: `${value}` };
};

/**
 * Drawing data for one panel, millimetres with y up: every piece's outline with the mark its
 * schedule item carries, opening outlines, and dimension lines. Walls, leaves and cladding are
 * elevations; roofs and bases are plans. Pass the whole schedule so a wall shows its openings.
 */
export function layoutPanel(
  panel: FrameSchedulePanel,
  ctx: FrameContext & { panels?: FrameSchedulePanel[] },
): PanelLayout {
  let panels = ctx.panels ?? [panel];
  let index = panels.indexOf(panel);
  if (index < 0 && panel.id !== undefined) index = panels.findIndex((p) => p.id === panel.id);
  if (index < 0) [panels, index] = [[panel], 0];
  const { pieces, warnings } = buildSchedulePieces(panels, ctx);
  const { markOf } = groupPieces(pieces);
  const shapes: LayoutShape[] = pieces
    .filter((p) => p.drawingPanelIndex === index && p.outline.length > 0)
    .map((p) => ({
      mark: markOf.get(p) ?? null,
      label: `${p.label} ${p.number}`,
      role: 'piece',
      points: p.outline,
    }));
  const dimensions: LayoutDimension[] = [];
  let view: PanelLayout['view'] = 'elevation';

  if (isStudWall(panel)) {
    // Drawn as framed: from its framed start, between its end walls where it fits between them.
    const { wall, openings } = getFramedWall(panel, panels, ctx);
    const L = wall.length;
    dimensions.push(dimension({ x: 0, y: 0 }, { x: L, y: 0 }, -250));
    dimensions.push(dimension({ x: 0, y: 0 }, { x: 0, y: getWallHeightAt(wall, 0) }, 250));
    if (wall.kind === 'sloped_wall')
      dimensions.push(dimension({ x: L, y: 0 }, { x: L, y: getWallHeightAt(wall, L) }, -250));
    for (const { panel: o } of openings) {
      const top = o.sillHeight + o.height;
      shapes.push({
        mark: null,
        label: o.name,
        role: 'opening',
        points: rectangle(o.position, o.sillHeight, o.position + o.width, top),
      });
      if (o.position > 0) dimensions.push(dimension({ x: 0, y: 0 }, { x: o.position, y: 0 }, -150));
      dimensions.push(dimension({ x: o.position, y: top }, { x: o.position + o.width, y: top }, 100));
      dimensions.push(
        dimension({ x: o.position + o.width, y: o.sillHeight }, { x: o.position + o.width, y: top }, 100),
      );
    }
  } else if (panel.kind === 'roof') {
    view = 'plan';
    const { run } = getRoofGeometry(panel);
    dimensions.push(
      dimension({ x: 0, y: -panel.eavesOverhang }, { x: panel.length, y: -panel.eavesOverhang }, -250),
    );
    dimensions.push(dimension({ x: -panel.sideOverhang, y: 0 }, { x: -panel.sideOverhang, y: run }, 250));
    if (panel.eavesOverhang > 0)
      dimensions.push(
        dimension({ x: -panel.sideOverhang, y: -panel.eavesOverhang }, { x: -panel.sideOverhang, y: 0 }, 250),
      );
  } else if (panel.kind === 'base') {
    view = 'plan';
    dimensions.push(dimension({ x: 0, y: 0 }, { x: panel.length, y: 0 }, -250));
    dimensions.push(dimension({ x: 0, y: 0 }, { x: 0, y: panel.width }, 250));
  }
  if (!isStudWall(panel) && panel.kind !== 'roof' && panel.kind !== 'base') {
    // Overall sizes from what was drawn: door leaf, cladding.
    const xs = shapes.flatMap((s) => s.points.map((p) => p.x));
    const ys = shapes.flatMap((s) => s.points.map((p) => p.y));
    if (xs.length) {
      const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
      dimensions.push(dimension({ x: x0, y: y0 }, { x: x1, y: y0 }, -250));
      dimensions.push(dimension({ x: x0, y: y0 }, { x: x0, y: y1 }, 250));
    }
  }
  const points = shapes.flatMap((s) => s.points);
  const bounds = points.length
    ? {
        minX: Math.min(...points.map((p) => p.x)),
        minY: Math.min(...points.map((p) => p.y)),
        maxX: Math.max(...points.map((p) => p.x)),
        maxY: Math.max(...points.map((p) => p.y)),
      }
    : { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  const ownWarnings = warnings.filter((w) => w.startsWith(`${panel.name}`));
  return {
    view,
    title: panel.name,
    bounds,
    shapes,
    dimensions,
    warnings: ownWarnings,
    notice: FRAME_STRUCTURE_NOTICE,
  };
}
