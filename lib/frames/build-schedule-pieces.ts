import { buildBaseFrame } from './base-frame';
import { buildCladding } from './cladding';
import { buildDoorLeaf } from './door-leaf';
import { numberPieces } from './number-pieces';
import type { FrameSchedulePanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import { buildRoofFrame } from './roof-frame';
import { buildStudWallFrame } from './stud-wall-frame';
import type { FrameContext, FramePiece } from './types';

/** Every piece of every panel, numbered; an opening's pieces come from its wall's build. */
export function buildSchedulePieces(panels: FrameSchedulePanel[], ctx: FrameContext): PanelBuild {
  const pieces: FramePiece[] = [];
  const warnings: string[] = [];
  panels.forEach((panel, index) => {
    const build = buildPanel(panels, index, ctx);
    pieces.push(...build.pieces);
    warnings.push(...build.warnings);
  });
  return { pieces: numberPieces(pieces), warnings };
}

function buildPanel(panels: FrameSchedulePanel[], index: number, ctx: FrameContext): PanelBuild {
  const panel = panels[index];
  switch (panel.kind) {
    case 'wall':
    case 'sloped_wall':
      return buildStudWallFrame(panels, index, ctx);
    case 'opening': {
      const hasWall = panels.some(
        (p) => (p.kind === 'wall' || p.kind === 'sloped_wall') && p.id === panel.wallId,
      );
      return {
        pieces: [],
        warnings: hasWall ? [] : [`${panel.name}: no wall has the id "${panel.wallId}", opening skipped`],
      };
    }
    case 'roof':
      return buildRoofFrame(panel, index, ctx);
    case 'base':
      return buildBaseFrame(panel, index, ctx);
    case 'door_leaf':
      return buildDoorLeaf(panel, index, panels, ctx);
    case 'cladding':
      return buildCladding(panel, index, panels, ctx);
    case 'free': {
      const at = { panelIndex: index, drawingPanelIndex: index };
      const one = {
        ...at,
        label: panel.label,
        sectionId: panel.sectionId,
        length: panel.length,
        angle: panel.angle,
        outline: [],
      };
      return { pieces: Array.from({ length: panel.quantity }, () => piece(one)), warnings: [] };
    }
  }
}
