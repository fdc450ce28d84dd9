import type { DoorLeafPanel, FrameSchedulePanel, OpeningPanel } from './panel-schemas';
import { getWallHeightAt, isStudWall } from './wall-height';

export type GeometryIssue = { path: (string | number)[]; message: string };

/** Checks that need more than one field, or more than one panel. Input is already shape-valid. */
export function findGeometryIssues(panels: FrameSchedulePanel[]): GeometryIssue[] {
  const issues: GeometryIssue[] = [];
  const add = (index: number, field: string, message: string) =>
    issues.push({ path: ['panels', index, field], message });
  const byId = new Map<string, FrameSchedulePanel>();
  panels.forEach((panel, index) => {
    if (panel.id === undefined) return;
    if (byId.has(panel.id)) add(index, 'id', `Another panel already has the id "${panel.id}"`);
    else byId.set(panel.id, panel);
  });
  const openingsSeen: OpeningPanel[] = [];

  panels.forEach((panel, i) => {
    switch (panel.kind) {
      case 'wall':
      case 'sloped_wall':
        if (panel.kind === 'sloped_wall' && panel.highHeight < panel.lowHeight)
          add(
            i,
            'highHeight',
            `High side (${panel.highHeight} mm) is lower than the low side (${panel.lowHeight} mm)`,
          );
        if (panel.centres > panel.length)
          add(
            i,
            'centres',
            `Stud centres (${panel.centres} mm) are larger than the wall length (${panel.length} mm)`,
          );
        for (const field of ['startWallId', 'endWallId'] as const) {
          const id = panel[field];
          if (id === undefined) continue;
          const other = byId.get(id);
          if (id === panel.id) add(i, field, 'A wall cannot fit against itself');
          else if (!other || !isStudWall(other))
            add(i, field, `No wall or sloped wall panel has the id "${id}"`);
        }
        if (panel.startWallId !== undefined && panel.startWallId === panel.endWallId)
          add(i, 'endWallId', 'The wall cannot meet the same wall at both ends');
        return;
      case 'opening': {
        const wall = byId.get(panel.wallId);
        if (!wall || !isStudWall(wall)) {
          add(i, 'wallId', `No wall or sloped wall panel has the id "${panel.wallId}"`);
          return;
        }
        const right = panel.position + panel.width;
        if (panel.width > wall.length)
          add(i, 'width', `Opening width (${panel.width} mm) is wider than its wall (${wall.length} mm)`);
        else if (right > wall.length)
          add(
            i,
            'position',
            `Opening runs past the wall's end: position + width = ${right} mm, wall length ${wall.length} mm`,
          );
        const roomAt = Math.min(
          getWallHeightAt(wall, panel.position),
          getWallHeightAt(wall, Math.min(right, wall.length)),
        );
        const top = panel.sillHeight + panel.height;
        if (top > roomAt)
          add(
            i,
            'height',
            `Opening top (sill + height = ${top} mm) is higher than the wall there (${Math.floor(roomAt)} mm)`,
          );
        const clash = openingsSeen.find(
          (o) => o.wallId === panel.wallId && o.position < right && panel.position < o.position + o.width,
        );
        if (clash) add(i, 'position', `Opening overlaps "${clash.name}" in the same wall`);
        openingsSeen.push(panel);
        return;
      }
      case 'roof':
        if (panel.pitch === undefined && panel.rise === undefined)
          add(i, 'pitch', 'Give the roof a pitch or a rise');
        else if (panel.pitch !== undefined && panel.rise !== undefined)
          add(i, 'rise', 'Give either a pitch or a rise, not both');
        if (panel.centres > panel.length)
          add(
            i,
            'centres',
            `Rafter centres (${panel.centres} mm) are larger than the roof length (${panel.length} mm)`,
          );
        return;
      case 'base':
        if (panel.joistCentres > panel.length)
          add(
            i,
            'joistCentres',
            `Joist centres (${panel.joistCentres} mm) are larger than the base length (${panel.length} mm)`,
          );
        if (panel.bearerCentres > panel.width)
          add(
            i,
            'bearerCentres',
            `Bearer centres (${panel.bearerCentres} mm) are larger than the base width (${panel.width} mm)`,
          );
        return;
      case 'door_leaf':
        checkDoorLeaf(panel, i, byId, add);
        return;
      case 'cladding':
        if (panel.wallId !== undefined) {
          const wall = byId.get(panel.wallId);
          if (!wall || !isStudWall(wall))
            add(i, 'wallId', `No wall or sloped wall panel has the id "${panel.wallId}"`);
        } else {
          if (panel.width === undefined) add(i, 'width', 'Give the width to clad, or choose a wall');
          if (panel.height === undefined) add(i, 'height', 'Give the height to clad, or choose a wall');
        }
        return;
      case 'free':
        return;
    }
  });
  return issues;
}

function checkDoorLeaf(
  panel: DoorLeafPanel,
  i: number,
  byId: Map<string, FrameSchedulePanel>,
  add: (index: number, field: string, message: string) => void,
) {
  let width = panel.openingWidth;
  let height = panel.openingHeight;
  if (panel.openingId !== undefined) {
    const opening = byId.get(panel.openingId);
    if (!opening || opening.kind !== 'opening') {
      add(i, 'openingId', `No opening panel has the id "${panel.openingId}"`);
      return;
    }
    width = opening.width;
    height = opening.height;
  }
  if (width === undefined) add(i, 'openingWidth', 'Give the opening width, or choose an opening');
  if (height === undefined) add(i, 'openingHeight', 'Give the opening height, or choose an opening');
  if (width === undefined || height === undefined) return;
  const leafWidth = width - panel.clearanceWidth;
  const leafHeight = height - panel.clearanceHeight;
  if (leafWidth <= 0)
    add(
      i,
      'clearanceWidth',
      `Width clearance (${panel.clearanceWidth} mm) leaves no leaf in a ${width} mm opening`,
    );
  else if (2 * panel.braceInset >= leafWidth)
    add(
      i,
      'braceInset',
      `Brace inset (${panel.braceInset} mm each side) leaves no room across a ${leafWidth} mm leaf`,
    );
  if (leafHeight <= 0)
    add(
      i,
      'clearanceHeight',
      `Height clearance (${panel.clearanceHeight} mm) leaves no leaf in a ${height} mm opening`,
    );
  else if (2 * panel.ledgeInset >= leafHeight)
    add(
      i,
      'ledgeInset',
      `Ledge inset (${panel.ledgeInset} mm top and bottom) leaves no room on a ${leafHeight} mm leaf`,
    );
}
