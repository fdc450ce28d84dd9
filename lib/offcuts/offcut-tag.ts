// One tag format for every offcut Kerfwise issues, whether made at the saw, entered from a rack list
// without a code, or in the demo rack: "K-" and a number of at least four digits (K-0042, K-12345).
// A yard's own codes, imported with its rack, are kept exactly as given and never reformatted.

export const OFFCUT_TAG_PREFIX = 'K-';

const ISSUED_TAG = /^K-(\d+)$/i;

/** The tag Kerfwise issues as its n-th offcut. */
export function formatOffcutTag(n: number): string {
  if (!Number.isSafeInteger(n) || n < 1) throw new RangeError(`Offcut tag number must be ≥ 1, got ${n}`);
  return `${OFFCUT_TAG_PREFIX}${String(n).padStart(4, '0')}`;
}

/** The number of a tag in Kerfwise's format (any case), or null for a yard's own code. */
export function offcutTagNumber(tag: string): number | null {
  const match = ISSUED_TAG.exec(tag.trim());
  if (!match) return null;
  const n = Number(match[1]);
  return Number.isSafeInteger(n) ? n : null;
}

/**
 * `count` new tags after the highest number in use, skipping any tag already taken (compared
 * without regard to case), so an imported code such as "k-0107" is never issued again.
 */
export function nextOffcutTags(count: number, inUse: Iterable<string>): string[] {
  const taken = new Set<string>();
  let top = 0;
  for (const tag of inUse) {
    taken.add(tag.trim().toUpperCase());
    const n = offcutTagNumber(tag);
    if (n !== null) top = Math.max(top, n);
  }
  const tags: string[] = [];
  for (let n = top + 1; tags.length < count; n++) {
    const tag = formatOffcutTag(n);
    if (!taken.has(tag)) tags.push(tag);
  }
  return tags;
}
