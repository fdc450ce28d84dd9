import 'server-only';
import { renderToBuffer } from '@react-pdf/renderer';
import { getDb } from '@/db';
import { getPlanQuote, quoteView } from '@/lib/quotes/get-plan-quote';
import { getJobById } from '@/lib/jobs/get-job';
import { getPlanById } from '@/lib/plans/get-plan';
import { getPlanContext } from '@/lib/plans/get-plan-context';
import type { PlanViewData } from '@/lib/queries/plans';
import { formatLength } from '@/lib/units';
import { getYardSettings } from '@/lib/yard/get-yard-settings';
import { CutSheetDocument } from './cut-sheet-document';

// Helvetica in PDFs has no prime marks: write feet and inches with plain quotes.
const plainQuotes = (text: string) => text.replace(/′/g, "'").replace(/″/g, '"');

/** The cut sheet of a plan as PDF bytes, with what an e-mail needs to go with it. */
export async function renderCutSheet({
  planId,
  forCustomer = false,
}: {
  planId: number;
  forCustomer?: boolean;
}) {
  const [plan, context, yard] = await Promise.all([
    getPlanById({ planId }),
    getPlanContext({ planId }),
    getYardSettings(),
  ]);
  const quote = quoteView(await getPlanQuote(await getDb(), { planId }));
  const { job } = await getJobById({ jobId: plan.jobId });
  const format = (mm: number) =>
    plainQuotes(formatLength(mm, yard.displayUnit)) + (yard.displayUnit === 'mm' ? ' mm' : '');
  const pdf = await renderToBuffer(
    <CutSheetDocument
      plan={JSON.parse(JSON.stringify(plan)) as PlanViewData}
      job={{ reference: job.reference, customerName: job.customerName, dueDate: job.dueDate }}
      yardName={yard.yardName}
      offcutTags={context.offcutTags}
      format={format}
      quote={quote}
      forCustomer={forCustomer}
      remaindersGoTo={yard.remaindersGoTo}
    />,
  );
  return { pdf, plan, job, yard, quote, fileName: `cut-sheet-${job.reference}-plan-${plan.id}.pdf` };
}
