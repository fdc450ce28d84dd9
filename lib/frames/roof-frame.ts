import { parallelCutBlank, rectangle, roundAngle, toDegrees, toRadians } from './geometry';
import type { RoofPanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import { getMemberCentres } from './stud-layout';
import { pieceName } from './piece-names';
import type { FrameContext, FramePiece } from './types';

export type RoofGeometry = {
  run: number;
  rise: number;
  pitch: number;
  slopeFactor: number;
  rafterLength: number;
};

/**
 * Rafter length along the slope: sqrt(run² + rise²), and each horizontal overhang o adds
 * o · slope / run (R. Hunter, "Framing Shed Roofs").
 */
export function getRoofGeometry(roof: RoofPanel): RoofGeometry {
  const run = roof.span;
  const rise = roof.rise ?? run * Math.tan(toRadians(roof.pitch ?? 0));
  const slopeFactor = Math.hypot(run, rise) / run;
  const rafterLength = (run + roof.eavesOverhang + roof.backOverhang) * slopeFactor;
  return { run, rise, pitch: toDegrees(Math.atan2(rise, run)), slopeFactor, rafterLength };
}

/**
 * Drawn in plan: x along the walls (0 … length), y down the run from the front wall (0) to the
 * back wall (span); overhangs reach beyond.
 */
export function buildRoofFrame(roof: RoofPanel, index: number, ctx: FrameContext): PanelBuild {
  const section = ctx.sections.get(roof.sectionId);
  if (!section)
    return { pieces: [], warnings: [`${roof.name}: section ${roof.sectionId} is unknown, panel skipped`] };
  const t = section.thickness;
  const { rafterLength: edge, pitch } = getRoofGeometry(roof);
  const angle = roundAngle(pitch);
  // Two parallel plumb cuts: the blank is the edge length plus the rafter's depth × tan(pitch).
  const rafterLength = parallelCutBlank(edge, section.width, pitch);
  const at = { panelIndex: index, drawingPanelIndex: index };
  const front = -roof.eavesOverhang;
  const back = roof.span + roof.backOverhang;
  const side = roof.sideOverhang;
  const pieces: FramePiece[] = [];
  const warnings: string[] = [];
  const note = 'plumb cut both ends; birdsmouth where it sits on each wall plate';

  for (const c of getMemberCentres(roof.length, roof.centres, t))
    pieces.push(
      piece({
        ...at,
        label: `${roof.name} rafter`,
        sectionId: roof.sectionId,
        length: rafterLength,
        angle,
        note,
        outline: rectangle(c - t / 2, front, c + t / 2, back),
      }),
    );

  if (side > 0) {
    // Verge: a fly rafter at each side, held off the end rafter by short lookouts.
    for (const x0 of [-side, roof.length + side - t])
      pieces.push(
        piece({
          ...at,
          label: `${roof.name} ${pieceName(ctx, 'fly rafter')}`,
          sectionId: roof.sectionId,
          length: rafterLength,
          angle,
          note: 'plumb cut both ends',
          outline: rectangle(x0, front, x0 + t, back),
        }),
      );
    const gap = side - t;
    if (gap > 0) {
      for (const y of getMemberCentres(back - front, roof.centres, t)) {
        const y0 = front + y - t / 2;
        pieces.push(
          piece({
            ...at,
            label: `${roof.name} lookout`,
            sectionId: roof.sectionId,
            length: gap,
            outline: rectangle(-side + t, y0, 0, y0 + t),
          }),
        );
        pieces.push(
          piece({
            ...at,
            label: `${roof.name} lookout`,
            sectionId: roof.sectionId,
            length: gap,
            outline: rectangle(roof.length, y0, roof.length + side - t, y0 + t),
          }),
        );
      }
    } else
      warnings.push(`${roof.name}: the side overhang is no wider than a rafter, so no lookouts are listed`);
  }

  if (roof.fasciaSectionId !== undefined) {
    const fascia = ctx.sections.get(roof.fasciaSectionId);
    if (!fascia)
      warnings.push(`${roof.name}: fascia section ${roof.fasciaSectionId} is unknown, fascia skipped`);
    else {
      const length = roof.length + 2 * side;
      const ft = fascia.thickness;
      pieces.push(
        piece({
          ...at,
          label: `${roof.name} eaves fascia`,
          sectionId: roof.fasciaSectionId,
          length,
          outline: rectangle(-side, front - ft, roof.length + side, front),
        }),
      );
      pieces.push(
        piece({
          ...at,
          label: `${roof.name} back fascia`,
          sectionId: roof.fasciaSectionId,
          length,
          outline: rectangle(-side, back, roof.length + side, back + ft),
        }),
      );
    }
  }
  return { pieces, warnings };
}
