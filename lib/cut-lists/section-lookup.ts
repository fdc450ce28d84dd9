import type { SectionRef } from './import-types';
import { nearestSection } from './nearest-section';

/** "47 × 100  C24" and "47x100 c24" are the same section. */
function normaliseSectionText(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/\s+/g, ' ')
    .replace(/(\d)\s*[x×*]\s*(\d)/g, '$1x$2');
}

export type SectionLookup = (text: string) => { ok: true; id: string } | { ok: false; message: string };

/** Finds a section by its name or code, case-insensitive; a text that fits two sections is refused. */
export function createSectionLookup(sections: SectionRef[]): SectionLookup {
  const ids = new Map<string, Set<string>>();
  for (const section of sections) {
    for (const key of [section.name, section.code]) {
      if (!key || key.trim() === '') continue;
      const name = normaliseSectionText(key);
      ids.set(name, (ids.get(name) ?? new Set()).add(section.id));
    }
  }
  return (text) => {
    const trimmed = text.trim();
    if (trimmed === '') return { ok: false, message: 'Section is missing.' };
    const found = ids.get(normaliseSectionText(trimmed));
    if (!found) {
      const near = nearestSection(trimmed, sections);
      return {
        ok: false,
        message: near
          ? `Unknown section "${trimmed}". Did you mean ${near.name}${near.code ? ` (${near.code})` : ''}?`
          : `Unknown section "${trimmed}". Use a section name or code from the yard's list.`,
      };
    }
    if (found.size > 1)
      return { ok: false, message: `"${trimmed}" matches more than one section; use the section code.` };
    return { ok: true, id: [...found][0] };
  };
}
