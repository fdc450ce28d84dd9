'use client';

import { useRouter } from 'next/navigation';
import { Notice } from '@/components/ui/notice';
import { importCustomersRequest } from '@/lib/queries/customers';
import { ApiError } from '@/lib/queries/fetch-json';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

type RowError = { row: number; message: string };

/** Uploads a customer CSV; all rows are added or none, and bad rows are listed. */
export function CustomerImport() {
  const router = useRouter();
  const upload = useApiMutation({
    mutationFn: async (file: File) => importCustomersRequest(await file.text()),
    onSuccess: () => router.refresh(),
  });
  const rows =
    upload.error instanceof ApiError
      ? (upload.error.body as { details?: { rows?: RowError[] } })?.details?.rows
      : undefined;
  const result = upload.isSuccess
    ? { tone: 'info' as const, text: `${upload.data.imported} customers added.`, rows: undefined }
    : upload.isError
      ? { tone: 'error' as const, text: upload.error.message, rows }
      : null;

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
        onChange={(e) => e.target.files?.[0] && upload.mutate(e.target.files[0])}
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
