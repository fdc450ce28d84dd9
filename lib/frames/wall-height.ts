import type { StudWallPanel } from './panel-schemas';

/** Height to the top of the top plate at x from the wall's start (low end for a sloped wall). */
export function getWallHeightAt(wall: StudWallPanel, x: number): number {
  if (wall.kind === 'wall') return wall.height;
  return wall.lowHeight + (x * (wall.highHeight - wall.lowHeight)) / wall.length;
}

export function isStudWall(panel: { kind: string }): panel is StudWallPanel {
  return panel.kind === 'wall' || panel.kind === 'sloped_wall';
}
