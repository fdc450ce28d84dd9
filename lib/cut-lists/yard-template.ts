import { CUT_LIST_TEMPLATE_CSV } from './cut-list-template';

type NamedSection = { name: string; code: string };

const sizeOf = (text: string) =>
  text
    .replace(/\s+/g, '')
    .replace(/[×*]/g, 'x')
    .toLowerCase()
    .match(/^\d+x\d+/)?.[0];

/**
 * The cut-list template with each example section swapped for the yard's own section of the same
 * size (by code), so a downloaded template imports as it is.
 */
export function buildYardCutListTemplate(sections: NamedSection[]): string {
  if (sections.length === 0) return CUT_LIST_TEMPLATE_CSV;
  return CUT_LIST_TEMPLATE_CSV.split('\n')
    .map((line, index) => {
      if (index === 0 || line === '') return line;
      const [example, ...rest] = line.split(',');
      const match = sections.find((s) => sizeOf(s.name) === sizeOf(example)) ?? sections[0];
      return [match.code, ...rest].join(',');
    })
    .join('\n');
}
