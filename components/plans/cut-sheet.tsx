'use client';

import { formatCustomerDate } from '@/lib/format/customer-date';
import { angleLine } from '@/lib/plans/angle-line';
import { actualCutMm, cutRange } from '@/lib/plans/cut-words';
import { useFormatLength } from '@/components/units/display-unit';
import type { PlanBoardView, PlanViewData } from '@/lib/queries/plans';
import { DiagramLegend } from './diagram-legend';
import { formatPence } from '@/lib/format/money';
import { PlanSectionBoards } from './plan-section-boards';

/** What the sheet draws: the plan's settings, sections, boards and price (the server page passes its own). */
type CutSheetPlan = Pick<PlanViewData, 'id' | 'settings' | 'sections' | 'price'> & {
  boards: PlanBoardView[];
};
type Job = { reference: string; customerName: string; dueDate: string | null };

/** The printable cut sheet: job, pieces by section, board diagrams and the quote. */
export function CutSheet({
  plan,
  job,
  yardName,
  offcutTags,
}: {
  plan: CutSheetPlan;
  job: Job;
  yardName: string;
  offcutTags: Record<number, string>;
}) {
  const fmt = useFormatLength();
  return (
    <article className="cut-sheet space-y-6 bg-white p-6 print:p-0" data-testid="cut-sheet">
      <header>
        <h1 className="text-3xl font-bold">Cut sheet · {job.reference}</h1>
        <p className="text-lg">
          {job.customerName}
          {job.dueDate ? ` · due ${formatCustomerDate(job.dueDate)}` : ''}
        </p>
        <p className="text-bark-soft">
          {yardName} · plan {plan.id} · kerf {plan.settings.kerfMm} mm · end trim {plan.settings.trimMm} mm
        </p>
      </header>
      {plan.sections.map((section) => {
        const boards = plan.boards.filter((b) => b.sectionId === section.sectionId);
        const pieces = new Map<
          string,
          {
            label: string;
            lengthMm: number;
            count: number;
            angle: string | null;
            marks?: string;
            cuts: number[];
          }
        >();
        for (const b of boards)
          for (const p of b.pieces) {
            const key = `${p.lengthMm}|${p.label}`;
            const e = pieces.get(key) ?? {
              label: p.label,
              lengthMm: p.lengthMm,
              count: 0,
              angle: angleLine(p, fmt),
              marks: p.marks,
              cuts: [],
            };
            e.count += 1;
            e.cuts.push(actualCutMm(p));
            pieces.set(key, e);
          }
        return (
          <div key={section.sectionId} className="space-y-3">
            <table className="w-full max-w-xl text-left">
              <caption className="text-left text-xl font-bold">{section.sectionName}: pieces</caption>
              <tbody>
                {[...pieces.values()]
                  .sort((a, b) => b.lengthMm - a.lengthMm)
                  .map((p) => (
                    <tr key={`${p.lengthMm}|${p.label}`} className="border-b border-shaving">
                      <td className="py-1">
                        {p.label || 'piece'}
                        {p.marks ? <span className="text-sm text-bark-soft"> · {p.marks}</span> : null}
                        {p.angle && (
                          <span className="block text-sm font-semibold" data-testid="sheet-angle">
                            {p.angle}
                          </span>
                        )}
                        {p.cuts.some((c) => c !== p.lengthMm) && (
                          <span className="block text-sm" data-testid="sheet-nominal">
                            nominal, cut to {cutRange(p.cuts, fmt)}
                          </span>
                        )}
                      </td>
                      <td className="py-1 text-right tabular-nums">{fmt(p.lengthMm)}</td>
                      <td className="py-1 text-right tabular-nums">× {p.count}</td>
                    </tr>
                  ))}
              </tbody>
            </table>
            <PlanSectionBoards
              name={`${section.sectionName}: boards`}
              boards={boards}
              kerfMm={plan.settings.kerfMm}
              offcutTags={offcutTags}
            />
          </div>
        );
      })}
      <DiagramLegend />
      {plan.price && (
        <table className="w-full max-w-3xl text-left break-inside-avoid">
          <caption className="text-left text-xl font-bold">Quote</caption>
          <tbody>
            {plan.price.lines.map((l, i) => (
              <tr key={i} className="border-b border-shaving">
                <td className="py-1">{l.description}</td>
                <td className="py-1 text-right tabular-nums">
                  {l.quantity} × {formatPence(l.unitPence)}
                </td>
                <td className="py-1 text-right tabular-nums">{formatPence(l.amountPence)}</td>
              </tr>
            ))}
            <tr className="text-lg font-bold">
              <td className="pt-2">Total</td>
              <td />
              <td className="pt-2 text-right tabular-nums">{formatPence(plan.price.totalPence)}</td>
            </tr>
          </tbody>
        </table>
      )}
      <p className="text-sm text-bark-soft">
        Kerfwise counts and cuts timber; it does not size structure: check sizes and spans against local
        building rules or an engineer. Cutting treated timber: dust mask and gloves, wash before eating, never
        burn offcuts.
      </p>
    </article>
  );
}
