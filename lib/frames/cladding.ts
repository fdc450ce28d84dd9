import { rectangle } from './geometry';
import type { CladdingPanel, FrameSchedulePanel, StudWallPanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
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
 * Boards of a cover width over a face: ceil(height / cover) courses, each the panel's length
 * (common practice), jointed where longer than stock, plus a waste allowance.
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
  const wallStuds =
    wall && horizontal
      ? getMemberCentres(wall.length, wall.centres, ctx.sections.get(wall.sectionId)?.thickness ?? 0)
      : undefined;
  const joints = getJointPositions(run, panel.maxStockLength, wallStuds);
  const stops = [0, ...joints, run];
  const courses = Math.ceil(across / panel.cover);
  const at = { panelIndex: index, drawingPanelIndex: index };
  const pieces: FramePiece[] = [];
  const jointNote = joints.length
    ? `course jointed at ${joints.map((j) => Math.round(j)).join(', ')} mm`
    : undefined;
  for (let c = 0; c < courses; c++) {
    const a0 = c * panel.cover;
    const a1 = Math.min(across, a0 + panel.cover);
    const ripped = a1 - a0 < panel.cover ? `rip to ${Math.round(a1 - a0)} mm cover` : undefined;
    const note = [jointNote, ripped].filter(Boolean).join('; ') || undefined;
    for (let k = 0; k + 1 < stops.length; k++) {
      const [r0, r1] = [stops[k], stops[k + 1]];
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
    }
  }
  if (joints.length)
    warnings.push(
      `${panel.name}: runs longer than ${panel.maxStockLength} mm are jointed at ${joints.map((j) => Math.round(j)).join(', ')} mm`,
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
