import type { FramePiece } from './types';

/** What each panel builder returns; pieces are numbered later, left to right. */
export type PanelBuild = { pieces: FramePiece[]; warnings: string[] };

export type NewPiece = Omit<FramePiece, 'number'>;

export const piece = (fields: NewPiece): FramePiece => ({ ...fields, number: 0 });
