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

const rafterBoard: PlanBoardView = {
  id: 1,
  boardNo: 1,
  sectionId: 7,
  source: 'stock',
  stockLengthId: 1,
  offcutId: null,
  lengthMm: 4800,
  trimMm: 15,
  // A rafter with two parallel plumb cuts at 11.3°, listed at its long point.
  pieces: [
    {
      pieceId: 'i1#0',
      jobItemId: 1,
      label: 'rafter',
      lengthMm: 2130,
      markMm: 2148,
      angleTenths: 113,
      cutNote: 'plumb cut both ends',
    },
  ],
  remainderMm: 2649,
  keepRemainder: true,
  status: 'pending',
};

describe('cut sheet PDF', () => {
  it('carries each angled piece’s angle, which end, and its long point', () => {
    const plan = {
      id: 3,
      settings: { kerfMm: 3, trimMm: 15 },
      sections: [{ sectionId: 7, sectionName: '47×150 C24' }],
      boards: [rafterBoard],
    } as unknown as PlanViewData;
    const doc = CutSheetDocument({
      plan,
      job: { reference: 'J-9', customerName: 'Test', dueDate: null },
      yardName: 'Yard',
      offcutTags: {},
      format: (mm) => String(mm),
      quote: null as unknown as CutSheetData['quote'],
      forCustomer: true,
      remaindersGoTo: 'yard',
    });
    expect(textOf(doc)).toContain('rafter\n11.3° plumb cut both ends, long point 2130');
  });
});
