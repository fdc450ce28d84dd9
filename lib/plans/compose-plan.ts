// Builds a whole plan from a job's planning data: solver input and result per section, totals,
// price and the saw's board list. No database access, so the demo seed can use it too.
import type { SolveInput, SolvePlan } from '@/solver';
import { priceCuttingPlan, toPence } from '@/lib/pricing';
import {
  buildSolverInput,
  type PlanningItem,
  type PlanningOffcut,
  type PlanningStock,
} from './build-solver-input';
import type { PieceDetails, PlanSection, PlanSettings } from './plan-shapes';
import { planBoardRows, sawCuts, summarisePlan } from './summarise-plan';

export type PlanningData = {
  items: (PlanningItem & {
    sectionId: number;
    label: string;
    angleTenths?: number | null;
    note?: string;
    marks?: string;
  })[];
  /** minKeepMm: the section's own shortest kept offcut; null or absent uses the yard's. */
  sections: { id: number; name: string; minKeepMm?: number | null }[];
  stock: (PlanningStock & { sectionId: number })[];
  offcuts: (PlanningOffcut & { sectionId: number })[];
};

export async function composePlan({
  data,
  settings,
  perCutChargePence,
  solve,
}: {
  data: PlanningData;
  settings: PlanSettings;
  perCutChargePence: number;
  solve: (input: SolveInput) => SolvePlan | Promise<SolvePlan>;
}) {
  const planSections: PlanSection[] = [];
  for (const section of [...data.sections].sort((a, b) => a.name.localeCompare(b.name))) {
    const input = buildSolverInput({
      items: data.items.filter((i) => i.sectionId === section.id),
      stock: data.stock.filter((s) => s.sectionId === section.id),
      offcuts: data.offcuts.filter((o) => o.sectionId === section.id),
      settings: { ...settings, minOffcutMm: section.minKeepMm ?? settings.minOffcutMm },
    });
    planSections.push({
      sectionId: section.id,
      sectionName: section.name,
      input,
      output: await solve(input),
    });
  }
  const price = priceCuttingPlan({
    perCutPence: perCutChargePence,
    sections: planSections.map((s) => ({
      sectionName: s.sectionName,
      boards: s.output.boards.map((b) => ({
        source: b.source,
        length: b.length,
        costPence: toPence(b.cost), // the solver's costs are the stock prices in pounds
        cuts: sawCuts(b),
      })),
    })),
  });
  const labels = new Map(
    data.items.map((i) => [
      i.id,
      { label: i.label, angleTenths: i.angleTenths, note: i.note, marks: i.marks } satisfies PieceDetails,
    ]),
  );
  return {
    sections: planSections,
    totals: summarisePlan(planSections),
    price,
    pricePence: price.totalPence,
    boards: planBoardRows(planSections, labels),
  };
}
