import type { FrameContext } from './types';

// One piece, two trades' words: North American (the default when no region is given) and UK.
const UK_NAMES = {
  'top plate': 'head plate',
  'bottom plate': 'sole plate',
  head: 'lintel',
  'king stud': 'full-height stud',
  trimmer: 'opening stud',
  'cripple above head': 'short stud above lintel',
  'cripple below sill': 'short stud below sill',
  'fly rafter': 'verge rafter',
} as const;

export type PieceName = keyof typeof UK_NAMES | 'stud' | 'sill' | 'noggin' | 'rafter';

/** The piece's name in the yard's region. */
export function pieceName(ctx: Pick<FrameContext, 'region'>, name: PieceName): string {
  return ctx.region === 'uk' && name in UK_NAMES ? UK_NAMES[name as keyof typeof UK_NAMES] : name;
}
