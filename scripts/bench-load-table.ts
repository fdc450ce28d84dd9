// Figures and the Markdown table of the load benchmark (scripts/bench-load.ts).
export type LoadRow = {
  setup: string;
  planners: number;
  pageRps: number;
  pageP95: number;
  plans: number;
  failed: number;
  turnaroundMedian: number;
  turnaroundP95: number;
};

/** Nearest-rank percentile of a list of milliseconds; NaN for an empty list. */
export function percentile(values: number[], p: number): number {
  if (values.length === 0) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

const LOAD_HEADING = '## Load: one embedded instance against server mode';

/** The load section of an existing docs/benchmarks.md (with its leading newline), or ''. */
export function keptLoadSection(doc: string): string {
  const at = doc.indexOf(`\n${LOAD_HEADING}`);
  return at < 0 ? '' : doc.slice(at);
}

/** The document without its load section, ready for a new one. */
export function withoutLoadSection(doc: string): string {
  const at = doc.indexOf(`\n${LOAD_HEADING}`);
  return (at < 0 ? doc : doc.slice(0, at)).trimEnd() + '\n';
}

const ms = (v: number) => (Number.isNaN(v) ? '–' : String(Math.round(v)));

export function loadTable(
  rows: LoadRow[],
  {
    seconds,
    tablets,
    officeClients,
    load,
  }: { seconds: number; tablets: number; officeClients: number; load: { start: number; end: number } },
): string {
  const lines = [
    '',
    LOAD_HEADING,
    '',
    `Measured by \`npm run bench:load\` on ${new Date().toISOString().slice(0, 10)}, Node ${process.version}, ` +
      `loopback, on the 2-core development machine (load average ${load.start.toFixed(1)} at the start, ` +
      `${load.end.toFixed(1)} at the end; the bench itself adds to it). Each level runs ` +
      `${seconds} s: planners create a 200-piece job and plan it (1 s search) back to back; ${tablets} saw ` +
      `tablets poll their queue every 5 s; ${officeClients} office clients open a page or list every second. ` +
      'Page figures cover the tablets and office clients only; turnaround is from the plan request to the ' +
      'stored plan.',
    '',
    '| setup | planners | page requests/s | page p95 ms | plans done | plans failed | turnaround median ms | turnaround p95 ms |',
    '| --- | --- | --- | --- | --- | --- | --- | --- |',
    ...rows.map(
      (r) =>
        `| ${r.setup} | ${r.planners} | ${r.pageRps.toFixed(1)} | ${ms(r.pageP95)} | ${r.plans} | ${r.failed} | ` +
        `${ms(r.turnaroundMedian)} | ${ms(r.turnaroundP95)} |`,
    ),
    '',
  ];
  return lines.join('\n');
}
