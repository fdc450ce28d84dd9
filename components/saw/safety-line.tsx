import { RISK_ASSESSMENT_NOTE, SAW_CAUTIONS, TREATED_CAUTIONS, type Caution } from '@/lib/saw/saw-cautions';

function CautionList({ cautions }: { cautions: Caution[] }) {
  return cautions.map((c) => (
    <li key={c.text}>
      {c.text} <span className="text-sm text-bark-soft">({c.source})</span>
    </li>
  ));
}

/** The usual cross-cut saw cautions in one tappable line, deferring to the yard's risk assessment. */
export function SafetyLine({ treated = false }: { treated?: boolean }) {
  return (
    <details
      className="no-print group rounded-lg border-2 border-amber bg-amber-light text-bark"
      data-testid="safety-line"
    >
      <summary className="flex min-h-12 cursor-pointer list-none items-center gap-2 px-4 text-base font-semibold">
        <span aria-hidden="true">⚠</span>
        <span className="flex-1">
          Blade at rest before hands go near, hands out of the no-go zone, long lengths supported
          {treated ? ' — treated timber: mask, gloves, end-grain preservative' : ''}.
        </span>
        <span className="text-sm underline group-open:hidden">More</span>
        <span className="hidden text-sm underline group-open:inline">Less</span>
      </summary>
      <ul className="list-disc space-y-1 px-9 pb-3 text-base">
        <CautionList cautions={SAW_CAUTIONS} />
        {treated && (
          <>
            <li className="list-none pt-1 font-semibold">Treated timber</li>
            <CautionList cautions={TREATED_CAUTIONS} />
          </>
        )}
        <li className="list-none font-semibold">{RISK_ASSESSMENT_NOTE}</li>
      </ul>
    </details>
  );
}
