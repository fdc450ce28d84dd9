'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { ApiError, fetchJson } from '@/lib/queries/fetch-json';

type RowError = { row: number; message: string };

/** Uploads a customer CSV; all rows are added or none, and bad rows are listed. */
export function CustomerImport() {
  const router = useRouter();
  const [result, setResult] = useState<{ tone: 'info' | 'error'; text: string; rows?: RowError[] } | null>(
    null,
  );

  async function upload(file: File) {
    try {
      const { imported } = await fetchJson<{ imported: number }>('/api/customers/import', {
        method: 'POST',
        headers: { 'content-type': 'text/csv' },
        body: await file.text(),
      });
      setResult({ tone: 'info', text: `${imported} customers added.` });
      router.refresh();
    } catch (err) {
      const rows =
        err instanceof ApiError
          ? (err.body as { details?: { rows?: RowError[] } })?.details?.rows
          : undefined;
      setResult({ tone: 'error', text: (err as Error).message, rows });
    }
  }

  return (
    <div className="space-y-3">
      <p className="text-sm text-bark-soft">
        Columns: name, contact, email, phone, address, account (retail or trade), credit days, discount
        percent.
      </p>
      <input
        type="file"
        accept=".csv,text/csv"
        aria-label="Customer CSV"
        onChange={(e) => e.target.files?.[0] && upload(e.target.files[0])}
      />
      {result && (
        <Notice tone={result.tone}>
          <p>{result.text}</p>
          {result.rows && (
            <ul className="mt-1 list-disc pl-5">
              {result.rows.map((r) => (
                <li key={r.row}>
                  Row {r.row}: {r.message}
                </li>
              ))}
            </ul>
          )}
        </Notice>
      )}
    </div>
  );
}
