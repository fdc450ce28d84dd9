// Shown above a board whose section differs from the board before it: the operator must fetch from
// another stack, so it is a banner, not a line of small print.
export function SectionChange({ from, to }: { from: string; to: string }) {
  return (
    <div
      role="status"
      className="rounded-lg border-4 border-bark bg-amber-light px-4 py-3 text-bark"
      data-testid="section-change"
    >
      <p className="text-2xl font-bold">Change section: {to}</p>
      <p className="text-lg font-semibold">The board before was {from}.</p>
    </div>
  );
}
