/**
 * Centre lines of members laid out along a run: one flush at each end, the rest at `centres`
 * measured from the start. Count is ceil(length / centres) + 1 (common practice). When the last
 * centre mark falls within a member's thickness of the end, that member is set hard against the
 * end member instead of overlapping it; where it cannot fit without overlapping
 * a neighbour (very short runs, centres under 2.5 thicknesses), it is left out.
 */
export function getMemberCentres(length: number, centres: number, thickness: number): number[] {
  if (length <= thickness) return [length / 2];
  const first = thickness / 2;
  const last = length - thickness / 2;
  const inner: number[] = [];
  for (let i = 1; i * centres < length; i++) {
    const at = Math.max(first + thickness, Math.min(i * centres, last - thickness));
    if (at <= last - thickness && at >= (inner.at(-1) ?? first) + thickness) inner.push(at);
  }
  return [first, ...inner, last];
}
