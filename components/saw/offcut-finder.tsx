'use client';
// Find an offcut by scanning its label or typing its tag.
import Link from 'next/link';
import { useCallback, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { findOffcutRequest, type OffcutBrief } from '@/lib/queries/saw';
import { formatLength, type DisplayUnit } from '@/lib/units';
import { LabelScanner } from './label-scanner';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

export function OffcutFinder({ unit }: { unit: DisplayUnit }) {
  const [tag, setTag] = useState('');
  const [scanning, setScanning] = useState(false);
  const find = useApiMutation({ mutationFn: findOffcutRequest });
  const { mutate } = find;
  const onScan = useCallback(
    (scanned: string) => {
      setScanning(false);
      setTag(scanned);
      mutate(scanned);
    },
    [mutate],
  );

  return (
    <div className="max-w-2xl space-y-4">
      <form
        className="flex flex-wrap gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          if (tag.trim()) find.mutate(tag.trim());
        }}
      >
        <label className="sr-only" htmlFor="offcut-tag">
          Offcut tag
        </label>
        <input
          id="offcut-tag"
          value={tag}
          onChange={(e) => setTag(e.target.value)}
          placeholder="Tag, e.g. K-0001"
          autoCapitalize="characters"
          className="min-h-14 flex-1 rounded-lg border-2 border-grain bg-white px-3 font-mono text-2xl uppercase"
        />
        <Button size="lg" type="submit" disabled={find.isPending}>
          Find
        </Button>
        <Button size="lg" variant="secondary" type="button" onClick={() => setScanning((s) => !s)}>
          {scanning ? 'Stop camera' : 'Scan label'}
        </Button>
      </form>
      {scanning && <LabelScanner onTag={onScan} />}
      {find.error && <Notice tone="error">{find.error.message}</Notice>}
      {find.data && <OffcutCard offcut={find.data} unit={unit} />}
    </div>
  );
}

function OffcutCard({ offcut, unit }: { offcut: OffcutBrief; unit: DisplayUnit }) {
  return (
    <section
      className="space-y-1 rounded-xl border-2 border-bark bg-white p-4 text-lg"
      data-testid="offcut-card"
    >
      <h2 className="font-mono text-3xl font-bold">{offcut.tag}</h2>
      <p className="text-2xl font-bold">
        {offcut.sectionName} · {formatLength(offcut.lengthMm, unit, { withUnit: true })}
      </p>
      <p>
        <strong>Where:</strong> {offcut.location || 'not recorded'} · <strong>Status:</strong> {offcut.status}
        {offcut.reservedFor ? ` for job ${offcut.reservedFor}` : ''}
      </p>
      <p className="text-bark-soft">{offcut.origin}</p>
      <Link
        href={`/labels/offcuts?ids=${offcut.id}`}
        className="mt-2 inline-flex min-h-12 items-center rounded-lg bg-amber px-4 font-bold text-white"
      >
        Print its label
      </Link>
    </section>
  );
}
