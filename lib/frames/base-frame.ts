import { rectangle } from './geometry';
import type { BasePanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import { getMemberCentres } from './stud-layout';
import type { FrameContext, FramePiece } from './types';

/**
 * Floor frame drawn in plan: two side rails along the length, joists across between them at
 * joist centres (the end ones close the perimeter), bearers underneath along the length.
 */
export function buildBaseFrame(base: BasePanel, index: number, ctx: FrameContext): PanelBuild {
  const bearerSectionId = base.bearerSectionId ?? base.sectionId;
  const joist = ctx.sections.get(base.sectionId);
  const bearer = ctx.sections.get(bearerSectionId);
  if (!joist || !bearer)
    return {
      pieces: [],
      warnings: [
        `${base.name}: section ${joist ? bearerSectionId : base.sectionId} is unknown, panel skipped`,
      ],
    };
  const t = joist.thickness;
  const at = { panelIndex: index, drawingPanelIndex: index };
  const pieces: FramePiece[] = [];
  const warnings: string[] = [];

  for (const c of getMemberCentres(base.width, base.bearerCentres, bearer.thickness))
    pieces.push(
      piece({
        ...at,
        label: `${base.name} bearer`,
        sectionId: bearerSectionId,
        length: base.length,
        outline: rectangle(0, c - bearer.thickness / 2, base.length, c + bearer.thickness / 2),
      }),
    );
  for (const y0 of [0, base.width - t])
    pieces.push(
      piece({
        ...at,
        label: `${base.name} side rail`,
        sectionId: base.sectionId,
        length: base.length,
        outline: rectangle(0, y0, base.length, y0 + t),
      }),
    );
  const joistLength = base.width - 2 * t;
  if (joistLength <= 0) warnings.push(`${base.name}: too narrow for joists between the side rails`);
  else
    for (const c of getMemberCentres(base.length, base.joistCentres, t))
      pieces.push(
        piece({
          ...at,
          label: `${base.name} joist`,
          sectionId: base.sectionId,
          length: joistLength,
          outline: rectangle(c - t / 2, t, c + t / 2, base.width - t),
        }),
      );
  return { pieces, warnings };
}
