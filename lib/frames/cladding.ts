import { rectangle } from './geometry';
import type { CladdingPanel, FrameSchedulePanel, StudWallPanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import { getFramedWall } from './fit-between';
import { getMemberCentres } from './stud-layout';
import type { FrameContext, FramePiece } from './types';
import { isStudWall } from './wall-height';

/**
 * Where a run longer than the longest stock length is jointed. On a known wall each joint lands
 * on a stud centre; otherwise the run is split into equal lengths.
 */
export function getJointPositions(run: number, maxLength: number, studCentres?: number[]): number[] {
  if (run <= maxLength) return [];
  const joints: number[] = [];
  if (studCentres) {
    let from = 0;
    while (run - from > maxLength) {
      const onStud = studCentres.filter((c) => c > from && c - from <= maxLength).at(-1);
      from = onStud ?? from + maxLength;
      joints.push(from);
    }
    return joints;
  }
  const pieces = Math.ceil(run / maxLength);
  for (let k = 1; k < pieces; k++) joints.push((k * run) / pieces);
  return joints;
}

/**
 * Courses across a face of `across` mm at `cover` mm each: ceil(across / cover) courses (common
 * practice). What does not divide evenly is taken off both edge boards alike, so neither edge is
 * left with a thin strip (common practice, no published source). Returns [from, to] per course.
 */
export function getCourseBands(across: number, cover: number): [number, number][] {
  const courses = Math.ceil(across / cover);
  if (courses <= 1) return [[0, across]];
  const edge = (across - (courses - 2) * cover) / 2;
  const bands: [number, number][] = [[0, edge]];
  for (let k = 0; k < courses - 2; k++) bands.push([edge + k * cover, edge + (k + 1) * cover]);
  bands.push([across - edge, across]);
  return bands;
}

type Gap = { name: string; r0: number; r1: number; a0: number; a1: number };

/** The stretches of [0, run] not blocked by any of the gaps. */
function openStretches(run: number, gaps: Gap[]): [number, number][] {
  const stretches: [number, number][] = [];
  let from = 0;
  for (const g of [...gaps].sort((a, b) => a.r0 - b.r0)) {
    if (g.r0 > from) stretches.push([from, g.r0]);
    from = Math.max(from, g.r1);
  }
  if (run > from) stretches.push([from, run]);
  return stretches;
}

/**
 * Boards of a cover width over a face, courses as in `getCourseBands`. On a wall with door or window
 * openings the boards stop at each opening, and the boards above and below it are cut to the
 * opening's width (ripped where only part of a course shows). Runs longer than stock are jointed,
 * on a stud where the wall is known. A waste allowance is added as spare boards.
 */
export function buildCladding(
  panel: CladdingPanel,
  index: number,
  panels: FrameSchedulePanel[],
  ctx: FrameContext,
): PanelBuild {
  const board = ctx.sections.get(panel.sectionId);
  const found = panel.wallId !== undefined ? panels.find((p) => p.id === panel.wallId) : undefined;
  const wall: StudWallPanel | undefined = found && isStudWall(found) ? found : undefined;
  const width = wall ? wall.length : panel.width;
  const height = wall
    ? wall.kind === 'wall'
      ? wall.height
      : Math.max(wall.lowHeight, wall.highHeight)
    : panel.height;
  if (!board || width === undefined || height === undefined)
    return { pieces: [], warnings: [`${panel.name}: its wall or section is unknown, panel skipped`] };
  const warnings: string[] = [];
  if (wall?.kind === 'sloped_wall')
    warnings.push(`${panel.name}: boards are listed full height; trim them to the slope on site`);
  const horizontal = panel.direction === 'horizontal';
  const run = horizontal ? width : height;
  const across = horizontal ? height : width;
  // Stud centres measured from the wall's outside corner, as the cladding is.
  const framed = wall ? getFramedWall(wall, panels, ctx) : undefined;
  const wallStuds =
    framed && horizontal
      ? getMemberCentres(
          framed.wall.length,
          framed.wall.centres,
          ctx.sections.get(framed.wall.sectionId)?.thickness ?? 0,
        ).map((c) => c + framed.offset)
      : undefined;
  // Openings in the cladding's own axes: r along the boards, a across them.
  const gaps: Gap[] = (framed?.openings ?? []).map(({ panel: o }) => {
    const [x0, x1] = [o.position + framed!.offset, o.position + framed!.offset + o.width];
    const [y0, y1] = [o.sillHeight, o.sillHeight + o.height];
    return horizontal
      ? { name: o.name, r0: x0, r1: x1, a0: y0, a1: y1 }
      : { name: o.name, r0: y0, r1: y1, a0: x0, a1: x1 };
  });
  const at = { panelIndex: index, drawingPanelIndex: index };
  const pieces: FramePiece[] = [];
  const allJoints = new Set<number>();
  const addBoard = (r0: number, r1: number, a0: number, a1: number, extra?: string) => {
    const ripped = a1 - a0 < panel.cover - 0.5 ? `rip to ${Math.round(a1 - a0)} mm cover` : undefined;
    const note = [ripped, extra].filter(Boolean).join('; ') || undefined;
    const outline = horizontal ? rectangle(r0, a0, r1, a1) : rectangle(a0, r0, a1, r1);
    pieces.push(
      piece({
        ...at,
        label: `${panel.name} board`,
        sectionId: panel.sectionId,
        length: r1 - r0,
        note,
        outline,
        // Cladding boards are sold by nominal length: factory ends, a few mm short is fine.
        nominal: true,
      }),
    );
  };
  for (const [a0, a1] of getCourseBands(across, panel.cover)) {
    const crossing = gaps.filter((g) => g.a0 < a1 && g.a1 > a0 && g.r0 < run && g.r1 > 0);
    for (const [s0, s1] of openStretches(run, crossing)) {
      const studs = wallStuds?.filter((c) => c > s0 && c < s1).map((c) => c - s0);
      const joints = getJointPositions(s1 - s0, panel.maxStockLength, studs).map((j) => s0 + j);
      joints.forEach((j) => allJoints.add(Math.round(j)));
      const jointNote = joints.length
        ? `course jointed at ${joints.map((j) => Math.round(j)).join(', ')} mm`
        : undefined;
      const stops = [s0, ...joints, s1];
      for (let k = 0; k + 1 < stops.length; k++) addBoard(stops[k], stops[k + 1], a0, a1, jointNote);
    }
    // Above and below an opening only part of the course shows: cut to the opening's width.
    for (const g of crossing) {
      const [r0, r1] = [Math.max(0, g.r0), Math.min(run, g.r1)];
      if (g.a0 > a0) addBoard(r0, r1, a0, Math.min(a1, g.a0), `below ${g.name}`);
      if (g.a1 < a1) addBoard(r0, r1, Math.max(a0, g.a1), a1, `above ${g.name}`);
    }
  }
  if (allJoints.size)
    warnings.push(
      `${panel.name}: runs longer than ${panel.maxStockLength} mm are jointed at ${[...allJoints].sort((a, b) => a - b).join(', ')} mm`,
    );
  const spare = Math.ceil((pieces.length * panel.wastePercent) / 100);
  if (spare > 0) {
    const longest = Math.max(...pieces.map((p) => p.length));
    for (let k = 0; k < spare; k++)
      pieces.push(
        piece({
          ...at,
          label: `${panel.name} spare board`,
          sectionId: panel.sectionId,
          length: longest,
          note: `waste allowance ${panel.wastePercent} %`,
          outline: [],
          nominal: true,
        }),
      );
  }
  return { pieces, warnings };
}
