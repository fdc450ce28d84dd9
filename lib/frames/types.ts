/** A section's cross-section in whole millimetres: thickness is the face seen in a wall elevation. */
export type SectionDimensions = { thickness: number; width: number };

export type FrameContext = {
  sections: ReadonlyMap<number, SectionDimensions>;
  /** The yard's minimum safe piece length: shorter pieces are warned about, with the usual fix. */
  minPieceMm?: number;
  /** Piece names: 'uk' (head plate, sole plate, lintel …) or 'na' (top plate, bottom plate, header …). */
  region?: 'uk' | 'na';
};

export type Point = { x: number; y: number };

/** One physical piece before grouping; lengths are exact here and rounded when grouped. */
export type FramePiece = {
  /** Panel whose schedule lists the piece. */
  panelIndex: number;
  /** Panel whose drawing shows the piece (an opening's pieces are drawn on its wall). */
  drawingPanelIndex: number;
  /** Label without a number, e.g. "back wall stud". */
  label: string;
  /** 1-based position among pieces with the same label, left to right. */
  number: number;
  sectionId: number;
  length: number;
  /** Cut angle off square in degrees (0 or absent = square ends). */
  angle?: number;
  note?: string;
  /** Sold by nominal length (cladding boards, common studs): may be cut a few mm short. */
  nominal?: boolean;
  /** Outline in the panel's drawing, millimetres, y up. */
  outline: Point[];
};

export type FrameItem = {
  /** "<panel number>.<piece number>", the same number the drawing shows. */
  mark: string;
  panelIndex: number;
  label: string;
  sectionId: number;
  length: number;
  quantity: number;
  angle?: number;
  note?: string;
  /** Sold by nominal length: the job line takes the section's (or yard's) tolerance. */
  nominal?: boolean;
};

export type FrameItemsResult = { items: FrameItem[]; warnings: string[]; notice: string };
