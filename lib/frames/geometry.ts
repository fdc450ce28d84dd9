import type { Point } from './types';

export function rectangle(x0: number, y0: number, x1: number, y1: number): Point[] {
  return [
    { x: x0, y: y0 },
    { x: x1, y: y0 },
    { x: x1, y: y1 },
    { x: x0, y: y1 },
  ];
}

export const toDegrees = (radians: number) => (radians * 180) / Math.PI;
export const toRadians = (degrees: number) => (degrees * Math.PI) / 180;

/** Angles are given to 0.1 degree. */
export const roundAngle = (degrees: number) => Math.round(degrees * 10) / 10;

/**
 * Blank for a piece with two parallel angled end cuts (a rafter with plumb cuts, a raking plate):
 * its edge length plus depth × tan(angle), so the piece is listed at its long point (trigonometry).
 */
export const parallelCutBlank = (edgeLength: number, depth: number, angleDegrees: number) =>
  edgeLength + depth * Math.tan(toRadians(angleDegrees));
