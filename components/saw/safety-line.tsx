// The usual saw cautions in one tappable line; the yard's own safe-working rules come first.
// Sources: HSE WIS16 and WIS36 (saw benches), WIS23 (wood dust), Control of Noise at Work
// Regulations 2005, USDA Wood Handbook FPL-GTR-190 ch. 15 (preservative-treated timber).
const CAUTIONS = [
  'Guards set for the cut and the riving knife in place.',
  'Push sticks for short pieces; hands clear of the blade line.',
  'Eye and hearing protection on.',
  'Dust extraction running before you start.',
  'Treated timber: dust mask and gloves, wash before eating, never burn the offcuts.',
];

export function SafetyLine({ treated = false }: { treated?: boolean }) {
  return (
    <details
      className="no-print group rounded-lg border-2 border-amber bg-amber-light text-bark"
      data-testid="safety-line"
    >
      <summary className="flex min-h-12 cursor-pointer list-none items-center gap-2 px-4 text-base font-semibold">
        <span aria-hidden="true">⚠</span>
        <span className="flex-1">
          Guards, riving knife, push sticks, eyes and ears, dust extraction
          {treated ? ' — treated timber: mask and gloves' : ''}.
        </span>
        <span className="text-sm underline group-open:hidden">More</span>
        <span className="hidden text-sm underline group-open:inline">Less</span>
      </summary>
      <ul className="list-disc space-y-1 px-9 pb-3 text-base">
        {CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
        <li className="list-none font-semibold">
          Your yard&apos;s own safe-working rules and training come first.
        </li>
      </ul>
    </details>
  );
}
