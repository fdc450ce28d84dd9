import type { SectionRef } from './import-types';

/**
 * Nominal inch sizes as UK yards sell them, in regularised millimetres ("4x2" is 47×100): common
 * practice, no published source. Larger numbers are taken as millimetres already.
 */
const NOMINAL_INCH_MM: Record<string, number[]> = {
  '1': [25, 22, 19],
  '1.5': [38, 36],
  '2': [47, 50, 44],
  '3': [75, 72, 63],
  '4': [100, 97, 89],
  '5': [125],
  '6': [150, 147, 140],
  '7': [175],
  '8': [200, 195],
  '9': [225, 220],
};

const sizesOf = (text: string) => {
  const m = /(\d+(?:\.\d+)?)\s*(?:mm)?\s*[x×*]\s*(\d+(?:\.\d+)?)/i.exec(text);
  return m ? [m[1], m[2]] : null;
};
const candidates = (n: string) => NOMINAL_INCH_MM[n] ?? [Number(n)];
const wordsOf = (text: string) =>
  new Set(
    text
      .toLowerCase()
      .replace(/\d+(?:\.\d+)?\s*[x×*]\s*\d+(?:\.\d+)?/g, ' ')
      .split(/[^a-z0-9]+/)
      .filter((w) => w.length > 1),
  );

/** Whether "4x2" or "100 x 47" names the section's size, in either order. */
function sizeMatches(typed: string[], section: string[]): boolean {
  const [a, b] = typed.map(candidates);
  const [t, w] = section.map(Number);
  return (a.includes(t) && b.includes(w)) || (a.includes(w) && b.includes(t));
}

/**
 * The section an unknown text most likely means: same size (nominal inches or mm, either order),
 * then the most words in common (treated, C24, CLS…). Only a size match is suggested.
 */
export function nearestSection(text: string, sections: SectionRef[]): SectionRef | null {
  const typedSize = sizesOf(text);
  if (!typedSize) return null;
  const typedWords = wordsOf(text);
  let best: { section: SectionRef; score: number } | null = null;
  for (const section of sections) {
    const size = sizesOf(section.name);
    if (!size || !sizeMatches(typedSize, size)) continue;
    const words = wordsOf(section.name);
    let score = 0;
    for (const w of typedWords) if (words.has(w)) score += 1;
    // "untreated" typed never suggests a treated section, and "treated" never an untreated one.
    if (typedWords.has('treated') !== words.has('treated')) score -= 2;
    if (!best || score > best.score) best = { section, score };
  }
  return best?.section ?? null;
}
