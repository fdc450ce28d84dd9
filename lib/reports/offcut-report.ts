// The offcut rack over time: made versus used each week, what lies on the rack now, and how old it is.
import { daysBetween, weekStartOf, weekStartsBetween } from './week';

export type OffcutMovementRow = {
  at: Date;
  kind: 'offcut_made' | 'offcut_used' | 'offcut_scrapped';
  lengthMm: number;
};

/** An offcut on the rack now (available or reserved). */
export type RackOffcutRow = {
  id: number;
  tag: string;
  sectionName: string;
  lengthMm: number;
  location: string;
  createdAt: Date;
  pencePerMetre: number;
};

export type OffcutWeek = {
  week: string;
  madeCount: number;
  madeMm: number;
  usedCount: number;
  usedMm: number;
  scrappedCount: number;
};
export type RackSection = { sectionName: string; count: number; lengthMm: number; valuePence: number };
export type AgeBucket = { label: string; count: number; lengthMm: number };
export type OldOffcut = {
  id: number;
  tag: string;
  sectionName: string;
  lengthMm: number;
  location: string;
  ageDays: number;
  clearSuggested: boolean;
};

export type OffcutReport = {
  weekly: OffcutWeek[];
  rackBySection: RackSection[];
  ageHistogram: AgeBucket[];
  oldest: OldOffcut[];
  totals: {
    made: number;
    used: number;
    scrapped: number;
    rackCount: number;
    rackMm: number;
    rackValuePence: number;
  };
};

export const AGE_BUCKETS: { label: string; maxDays: number }[] = [
  { label: '0–30 days', maxDays: 30 },
  { label: '31–60 days', maxDays: 60 },
  { label: '61–90 days', maxDays: 90 },
  { label: '91–180 days', maxDays: 180 },
  { label: 'Over 180 days', maxDays: Infinity },
];

export function computeOffcutReport({
  movements,
  rack,
  start,
  end,
  now,
  clearAfterDays,
  oldestCount = 10,
}: {
  movements: OffcutMovementRow[];
  rack: RackOffcutRow[];
  start: Date;
  end: Date;
  now: Date;
  clearAfterDays: number;
  oldestCount?: number;
}): OffcutReport {
  const weeks = new Map(
    weekStartsBetween(start, new Date(end.getTime() - 1)).map((week) => [
      week,
      { week, madeCount: 0, madeMm: 0, usedCount: 0, usedMm: 0, scrappedCount: 0 },
    ]),
  );
  for (const m of movements) {
    if (m.at < start || m.at >= end) continue;
    const w = weeks.get(weekStartOf(m.at))!;
    if (m.kind === 'offcut_made') {
      w.madeCount++;
      w.madeMm += m.lengthMm;
    } else if (m.kind === 'offcut_used') {
      w.usedCount++;
      w.usedMm += m.lengthMm;
    } else w.scrappedCount++;
  }

  const sections = new Map<string, RackSection & { exact: number }>();
  const buckets = AGE_BUCKETS.map((b) => ({ label: b.label, count: 0, lengthMm: 0 }));
  for (const o of rack) {
    const s = sections.get(o.sectionName) ?? {
      sectionName: o.sectionName,
      count: 0,
      lengthMm: 0,
      valuePence: 0,
      exact: 0,
    };
    s.count++;
    s.lengthMm += o.lengthMm;
    s.exact += (o.lengthMm * o.pencePerMetre) / 1000;
    sections.set(o.sectionName, s);
    const age = daysBetween(o.createdAt, now);
    const bucket = buckets[AGE_BUCKETS.findIndex((b) => age <= b.maxDays)];
    bucket.count++;
    bucket.lengthMm += o.lengthMm;
  }
  const rackBySection = [...sections.values()]
    .map(({ exact, ...s }) => ({ ...s, valuePence: Math.round(exact) }))
    .sort((a, b) => b.valuePence - a.valuePence);

  const oldest = [...rack]
    .sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime() || a.id - b.id)
    .slice(0, oldestCount)
    .map((o) => {
      const ageDays = daysBetween(o.createdAt, now);
      return {
        id: o.id,
        tag: o.tag,
        sectionName: o.sectionName,
        lengthMm: o.lengthMm,
        location: o.location,
        ageDays,
        clearSuggested: ageDays >= clearAfterDays,
      };
    });

  const weekly = [...weeks.values()];
  return {
    weekly,
    rackBySection,
    ageHistogram: buckets,
    oldest,
    totals: {
      made: weekly.reduce((n, w) => n + w.madeCount, 0),
      used: weekly.reduce((n, w) => n + w.usedCount, 0),
      scrapped: weekly.reduce((n, w) => n + w.scrappedCount, 0),
      rackCount: rack.length,
      rackMm: rack.reduce((n, o) => n + o.lengthMm, 0),
      rackValuePence: rackBySection.reduce((n, s) => n + s.valuePence, 0),
    },
  };
}
