// Folds the many ways people type feet, inches and spaces into one plain ASCII form:
// primes (′ ″), smart quotes pasted from word processors, two apostrophes for inches,
// non-breaking and thin spaces, and dashes other than the hyphen.
const REPLACEMENTS: Array<[RegExp, string]> = [
  [/[\u2032\u2019\u2018\u00b4`]/g, "'"],
  [/[\u2033\u201c\u201d]/g, '"'],
  [/''/g, '"'],
  [/[\u00a0\u2007\u2009\u202f\t]/g, ' '],
  [/[\u2010\u2011\u2012\u2013\u2014\u2212]/g, '-'],
  [/\u2044/g, '/'],
];

export function normaliseLengthText(text: string): string {
  let result = text;
  for (const [pattern, replacement] of REPLACEMENTS) result = result.replace(pattern, replacement);
  return result.trim().replace(/ +/g, ' ').toLowerCase();
}
