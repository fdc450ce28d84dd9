import { isValidElement, type ReactNode } from 'react';
import { describe, expect, it } from 'vitest';
import { CutSheetDocument, type CutSheetData } from '@/lib/cut-sheets/cut-sheet-document';
import type { PlanBoardView, PlanViewData } from '@/lib/queries/plans';

/** Every string the document tree holds, in order (the PDF's text before layout). */
function textOf(node: ReactNode): string {
  if (typeof node === 'string' || typeof node === 'number') return String(node);
  if (Array.isArray(node)) return node.map(textOf).join('');
  if (isValidElement<{ children?: ReactNode }>(node)) return textOf(node.props.children);
  return '';
}

const board = (fields: Partial<PlanBoardView>): PlanBoardView => ({
  id: 1,
  boardNo: 1,
  sectionId: 7,
  source: 'stock',
  stockLengthId: 1,
  offcutId: null,
  lengthMm: 4800,
  trimMm: 0,
  pieces: [],
  remainderMm: 0,
  keepRemainder: false,
  status: 'pending',
  ...fields,
});

// DESIGN.md check values: 4 × 2400 at 5 mm tolerance → 4.8 m boards cut once, pieces 2398 and 2399 mm,
// no trim; 1 × 3600 exact on 3.6 m stock → sold full length, no cut.
const twoStuds = board({
  pieces: [
    { pieceId: 'I1', jobItemId: 1, label: 'stud', lengthMm: 2400, cutMm: 2398, markMm: 2398 },
    { pieceId: 'I1', jobItemId: 1, label: 'stud', lengthMm: 2400, cutMm: 2399, markMm: 4800 },
  ],
});
const post = board({
  id: 2,
  boardNo: 2,
  lengthMm: 3600,
  fullLength: true,
  pieces: [{ pieceId: 'I2', jobItemId: 2, label: 'post', lengthMm: 3600, cutMm: 3600, markMm: 3600 }],
});

describe('cut sheet PDF: nominal pieces and full lengths', () => {
  const text = textOf(
    CutSheetDocument({
      plan: {
        id: 3,
        settings: { kerfMm: 3, trimMm: 5 },
        sections: [{ sectionId: 7, sectionName: '38×89 CLS' }],
        boards: [twoStuds, post],
      } as unknown as PlanViewData,
      job: { reference: 'J-9', customerName: 'Test', dueDate: null },
      yardName: 'Yard',
      offcutTags: {},
      format: (mm) => String(mm),
      quote: null as unknown as CutSheetData['quote'],
      forCustomer: false,
      remaindersGoTo: 'yard',
    }),
  );

  it('gives the listed length and the lengths actually cut', () => {
    expect(text).toContain('stud\nnominal, cut to 2398–2399');
    expect(text).toContain('2398 (listed 2400) + 2399 (listed 2400)');
  });

  it('says "full length, no cut" for a board sold whole, with no remainder note', () => {
    expect(text).toContain('3600: 3600, full length, no cut');
    expect(text).not.toContain('3600: 3600, full length, no cut ·');
  });
});
