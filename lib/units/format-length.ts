import { IMPERIAL_DENOMINATOR } from './length-constants';
import type { DisplayUnit } from '@/db/enums';

const SIXTEENTHS_PER_FOOT = 12 * IMPERIAL_DENOMINATOR;

/** Metric as plain millimetres, grouped by spaces only from five digits up: 1500, 15 000 (Metric Handbook, ch. 1). */
export function formatMillimetres(mm: number): string {
  const whole = Math.round(Math.abs(mm));
  const digits = String(whole);
  const grouped = digits.length < 5 ? digits : digits.replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
  return mm < 0 && whole !== 0 ? `-${grouped}` : grouped;
}

/** Whole millimetres to the nearest 1/16 in, halves rounded up, computed in integers (1 in = 25.4 mm). */
export function millimetresToSixteenths(mm: number): number {
  const whole = Math.round(mm);
  // sixteenths = mm × 16 / 25.4 = mm × 160 / 254
  return Math.floor((2 * whole * 160 + 254) / (2 * 254));
}

function reduceFraction(num: number, den: number): string {
  let [a, b] = [num, den];
  while (b) [a, b] = [b, a % b];
  return `${num / a}/${den / a}`;
}

// After feet the whole inches are always written, even 0: 8′-0 7/16″, never 8′-7/16″, which
// reads as a dash and 7/16 and is easily taken for 8 ft 7 in.
function formatInches(sixteenths: number, afterFeet: boolean): string {
  const whole = Math.floor(sixteenths / IMPERIAL_DENOMINATOR);
  const rest = sixteenths % IMPERIAL_DENOMINATOR;
  if (rest === 0) return `${whole}″`;
  const fraction = reduceFraction(rest, IMPERIAL_DENOMINATOR);
  return whole === 0 && !afterFeet ? `${fraction}″` : `${whole} ${fraction}″`;
}

/**
 * Feet-dash-inches to the nearest 1/16 in with reduced fractions: 7′-8 5/8″, 4′-0″, 8′-0 7/16″; inches alone
 * under a foot: 11 1/2″ (open textbook "Fundamentals – Drawings and Specifications").
 */
export function formatFeetInches(mm: number): string {
  const sixteenths = millimetresToSixteenths(Math.abs(mm));
  const sign = mm < 0 && sixteenths !== 0 ? '-' : '';
  const feet = Math.floor(sixteenths / SIXTEENTHS_PER_FOOT);
  const inches = formatInches(sixteenths % SIXTEENTHS_PER_FOOT, feet > 0);
  return feet === 0 ? `${sign}${inches}` : `${sign}${feet}′-${inches}`;
}

/**
 * The one length formatter: millimetres or feet and inches, as the display unit says. `withUnit` adds
 * " mm" to metric (feet and inches carry their marks), for text where a bare number could be misread.
 */
export function formatLength(mm: number, unit: DisplayUnit, { withUnit = false } = {}): string {
  if (unit === 'imperial') return formatFeetInches(mm);
  return withUnit ? `${formatMillimetres(mm)} mm` : formatMillimetres(mm);
}
