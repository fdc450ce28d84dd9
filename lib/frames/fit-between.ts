import type { FrameSchedulePanel, OpeningPanel, StudWallPanel } from './panel-schemas';
import type { FrameContext } from './types';
import { getWallHeightAt, isStudWall } from './wall-height';

/**
 * A stud wall as it is framed. Where walls of one schedule meet at a corner, a side wall fits
 * between the end walls (front and back) instead of running past them, so the corner is not counted
 * twice: its plates are shortened by each end wall's depth (that wall's section width, the plate
 * lying flat). The panel's length and opening positions stay outside measurements from the corner;
 * a sloped wall keeps its slope, so its framed ends take the heights at those points.
 */
export type FramedWall = {
  /** The wall to frame, from its framed start (x = 0) to its framed end. */
  wall: StudWallPanel;
  /** How far the framed start lies from the outside corner. */
  offset: number;
  /** Openings in the wall, positions measured from the framed start. */
  openings: { panel: OpeningPanel; index: number }[];
  /** "fits between front wall and back wall", or undefined when the wall runs to both corners. */
  fit?: string;
};

const endWall = (panels: FrameSchedulePanel[], id: string | undefined, self: StudWallPanel) => {
  if (id === undefined || id === self.id) return undefined;
  const found = panels.find((p) => p.id === id);
  return found && isStudWall(found) ? found : undefined;
};

export function getFramedWall(
  wall: StudWallPanel,
  panels: FrameSchedulePanel[],
  ctx: Pick<FrameContext, 'sections'>,
): FramedWall {
  const atStart = endWall(panels, wall.startWallId, wall);
  const atEnd = endWall(panels, wall.endWallId, wall);
  const depth = (w?: StudWallPanel) => (w ? (ctx.sections.get(w.sectionId)?.width ?? 0) : 0);
  const [start, end] = [depth(atStart), depth(atEnd)];
  const length = wall.length - start - end;
  const framed: StudWallPanel =
    wall.kind === 'wall'
      ? { ...wall, length }
      : {
          ...wall,
          length,
          lowHeight: getWallHeightAt(wall, start),
          highHeight: getWallHeightAt(wall, wall.length - end),
        };
  const openings = panels
    .map((panel, index) => ({ panel, index }))
    .filter(
      (o): o is { panel: OpeningPanel; index: number } =>
        o.panel.kind === 'opening' && wall.id !== undefined && o.panel.wallId === wall.id,
    )
    .map(({ panel, index }) => ({ panel: { ...panel, position: panel.position - start }, index }));
  const names = [atStart, atEnd].filter((w) => w !== undefined).map((w) => w.name);
  const fit = names.length === 0 ? undefined : `fits between ${names.join(' and ')}`;
  return { wall: framed, offset: start, openings, fit };
}
