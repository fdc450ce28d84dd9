import { LONGEST_LENGTH_MM } from './length-constants';
import { lengthError, type ParseLengthResult } from './length-result';
import { normaliseLengthText } from './normalise-length-text';
import { parseImperial } from './parse-imperial';
import { parseMetric } from './parse-metric';

const LONGEST_INPUT = 40;

const HINT = 'Write a length like 2400, 2400 mm, 2.4 m, 7\'-8 5/8" or 92 5/8".';

/**
 * Reads a length typed by a person and returns whole millimetres. Never throws.
 * - A bare number is millimetres ("2400"); thousands may be grouped with spaces ("15 000") but
 *   not commas, because "2,4" means 2.4 in much of Europe and the two cannot be told apart.
 * - A bare number with a fraction ("92 5/8") is inches: millimetres never carry fractions.
 * - Centimetres are refused: the trade writes millimetres or metres.
 * Zero is accepted here; callers decide whether zero is a valid length.
 */
export function parseLength(input: unknown): ParseLengthResult {
  if (typeof input !== 'string') return lengthError('Length must be text.');
  if (input.length > LONGEST_INPUT) return lengthError('Length is too long to be a length.');
  const text = normaliseLengthText(input);
  if (text === '') return lengthError('Length is missing.');
  if (text.startsWith('-')) return lengthError('Length cannot be negative.');
  if (/\d,\d/.test(text)) return lengthError('Leave out the comma: write 2400 or 2.4 m, not 2,400 or 2,4.');
  if (/\dcm$|\d cm$|centimet/.test(text))
    return lengthError('Write millimetres or metres, not centimetres (240 cm is 2400 mm).');

  let mm = parseMetric(text);
  if (mm === null) {
    const imperial = parseImperial(text);
    if (imperial.kind === 'error') return lengthError(imperial.message);
    if (imperial.kind === 'no-match') return lengthError(`"${input.trim()}" is not a length. ${HINT}`);
    mm = imperial.mm;
  }
  if (mm > BigInt(LONGEST_LENGTH_MM)) return lengthError('Length is longer than 1 km; check the units.');
  return { ok: true, mm: Number(mm) };
}
