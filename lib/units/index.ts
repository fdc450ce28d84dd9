// Lengths are whole millimetres in data; these read and write them the way the trade does.
export { parseLength } from './parse-length';
export { formatLength, formatMillimetres, formatFeetInches, millimetresToSixteenths } from './format-length';
export { lengthInputSchema } from './length-input-schema';
export type { ParseLengthResult } from './length-result';
export type { DisplayUnit } from '@/db/enums';
export { shortPieceMessage } from './short-piece';
