import type { Region } from '@/db/enums';
import { formatFeetInches, formatMillimetres } from './format-length';

const MM_PER_FOOT = 304.8; // 12 × 25.4 mm, exact

/**
 * A stock length the way the yard's trade names it: UK merchants sell "4.8 m" (metres, one decimal
 * for whole 100 mm steps); North American yards sell "16 ft". Lengths off those steps fall back to
 * millimetres or feet-inches, so no length is ever rounded into another.
 */
export function stockLengthName(mm: number, region: Region): string {
  if (region === 'na') {
    const feet = Math.round(mm / MM_PER_FOOT);
    // Stored lengths are whole millimetres: 16 ft = 4876.8 mm is kept as 4877.
    return Math.abs(mm - feet * MM_PER_FOOT) < 1 ? `${feet} ft` : formatFeetInches(mm);
  }
  return mm % 100 === 0 ? `${(mm / 1000).toFixed(1)} m` : `${formatMillimetres(mm)} mm`;
}
