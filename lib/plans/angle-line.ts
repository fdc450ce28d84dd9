/** "11.3° top cut, long point 2130": an angled piece is listed at its long point. */
export function angleLine(
  p: { angleTenths?: number; cutNote?: string; lengthMm: number },
  len: (mm: number) => string,
): string | null {
  if (!p.angleTenths) return null;
  return `${(p.angleTenths / 10).toFixed(1)}° ${p.cutNote || 'angled cut'}, long point ${len(p.lengthMm)}`;
}
