// Lengths at the saw in the yard's units; millimetres carry their unit so no one reads them as inches.
import { formatLength } from '@/lib/units';

export function sawLength(mm: number, unit: 'mm' | 'imperial'): string {
  return unit === 'mm' ? `${formatLength(mm, 'mm')} mm` : formatLength(mm, 'imperial');
}
