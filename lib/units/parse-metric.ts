import { readDecimal, roundFraction, scaleFraction, type Fraction } from './exact-fraction';
import { MM_PER_METRE } from './length-constants';

// Millimetres: "2400", "2400mm", "2400 mm", "15 000" (space-grouped thousands, as we print them).
// Metres: "2.4m", "2.4 m", "2.4 metres". Decimal millimetres are rounded to whole millimetres.
const METRIC = /^(\d{1,3}(?: \d{3})+|\d*\.?\d+)(?: ?(mm|millimet(?:re|er)s?|m|met(?:re|er)s?))?$/;

/** Returns whole millimetres, or null when the text is not a metric length. */
export function parseMetric(text: string): bigint | null {
  const match = METRIC.exec(text);
  if (!match) return null;
  const value = readDecimal(match[1].replace(/ /g, ''));
  if (!value) return null;
  const unit = match[2] ?? 'mm';
  const isMetres = unit === 'm' || unit.startsWith('met');
  const mm: Fraction = isMetres ? scaleFraction(value, MM_PER_METRE) : value;
  return roundFraction(mm);
}
