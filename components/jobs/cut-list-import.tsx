'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useDropzone } from 'react-dropzone';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { xlsxToTsv } from '@/lib/cut-lists/read-xlsx';
import { buildYardCutListTemplate } from '@/lib/cut-lists/yard-template';
import { cn } from '@/lib/cn';
import { ApiError } from '@/lib/queries/fetch-json';
import { importItemsRequest } from '@/lib/queries/jobs';
import { sectionOptionsQuery } from '@/lib/queries/sections';
import { MAX_IMPORT_BYTES } from '@/lib/validations/jobs';
import { ImportErrors, type RowError } from './import-errors';
import { jobKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

type Outcome =
  { kind: 'done'; text: string } | { kind: 'errors'; summary: string; errors: RowError[] } | null;

/** What the last upload came to: rows imported, or the rows to fix. */
function uploadOutcome(upload: {
  data?: { imported: number };
  variables?: { source: string };
  error: Error | null;
}): Outcome {
  if (upload.data && upload.variables) {
    const { imported } = upload.data;
    return {
      kind: 'done',
      text: `Imported ${imported} row${imported === 1 ? '' : 's'} from ${upload.variables.source}.`,
    };
  }
  if (!upload.error) return null;
  const body = upload.error instanceof ApiError ? (upload.error.body as ImportRefusal | null) : null;
  return {
    kind: 'errors',
    summary: upload.error.message,
    errors: body?.errors ?? body?.details?.errors ?? [],
  };
}
type ImportRefusal = { errors?: RowError[]; details?: { errors?: RowError[] } };

const XLSX = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet';

/**
 * Import a cut list from a CSV or .xlsx file (drop or pick) or text pasted from a spreadsheet. A
 * workbook's first sheet is turned into tab-separated text here; the server checks every row.
 */
export function CutListImport({ jobId }: { jobId: number }) {
  const sections = useQuery(sectionOptionsQuery());
  // A workbook the browser could not read never reaches the server; its message is kept here.
  const [unread, setUnread] = useState<Outcome>(null);
  const [replace, setReplace] = useState(false);
  const [pasted, setPasted] = useState('');
  const upload = useApiMutation({
    mutationFn: ({ text }: { text: string; source: string }) => importItemsRequest(jobId, text, replace),
    invalidates: [jobKeys.detail(jobId)],
    onSuccess: () => setPasted(''),
  });
  const busy = upload.isPending;
  const outcome: Outcome = unread ?? uploadOutcome(upload);

  function send(text: string, source: string) {
    setUnread(null);
    upload.mutate({ text, source });
  }

  const dropzone = useDropzone({
    multiple: false,
    maxSize: MAX_IMPORT_BYTES,
    accept: {
      'text/csv': ['.csv'],
      'text/plain': ['.txt', '.tsv'],
      'text/tab-separated-values': ['.tsv'],
      [XLSX]: ['.xlsx'],
    },
    disabled: busy,
    onDropAccepted: async ([file]) => {
      if (!file.name.toLowerCase().endsWith('.xlsx')) return send(await file.text(), file.name);
      const text = await xlsxToTsv(await file.arrayBuffer()).catch(() => null);
      if (text !== null) return send(text, file.name);
      upload.reset();
      setUnread({
        kind: 'errors',
        summary: `${file.name} was not read.`,
        errors: [
          { line: 1, column: null, message: 'This is not a workbook we can open; save it as .xlsx or CSV.' },
        ],
      });
    },
    onDropRejected: ([rejection]) => {
      upload.reset();
      setUnread({
        kind: 'errors',
        summary: `${rejection.file.name} was not read.`,
        errors: rejection.errors.map((e) => ({
          line: 1,
          column: null,
          message: e.code === 'file-too-large' ? 'The file is larger than 5 MB; split it.' : e.message,
        })),
      });
    },
  });

  const template = sections.data ? buildYardCutListTemplate(sections.data) : null;
  return (
    <div className="space-y-4">
      <div
        {...dropzone.getRootProps({
          className: cn(
            'cursor-pointer rounded-xl border-2 border-dashed p-6 text-center',
            dropzone.isDragActive ? 'border-spruce bg-spruce-light' : 'border-grain bg-sawdust',
          ),
        })}
        data-testid="cut-list-dropzone"
      >
        <input {...dropzone.getInputProps()} aria-label="Cut list file" />
        <p className="font-semibold">
          {busy ? 'Checking every row…' : 'Drop a cut list (CSV or .xlsx) here, or click to choose one'}
        </p>
        <p className="mt-1 text-sm text-bark-soft">
          Columns section, length, quantity, label, note, and optionally tolerance (exact, nominal or mm
          short). Lengths in mm (2400), metres (2.4m) or feet-inches (7&apos; 8 5/8&quot;). Up to 5 MB.
        </p>
      </div>
      <div className="flex flex-wrap items-center gap-4">
        {template && (
          <a
            className="font-semibold text-spruce underline"
            download="kerfwise-cut-list-template.csv"
            href={`data:text/csv;charset=utf-8,${encodeURIComponent(template)}`}
          >
            Download the template
          </a>
        )}
        <label className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={replace}
            onChange={(e) => setReplace(e.target.checked)}
            className="h-5 w-5"
          />
          Replace the current list instead of adding to it
        </label>
      </div>
      <details>
        <summary className="cursor-pointer font-semibold text-spruce">Paste rows from a spreadsheet</summary>
        <div className="mt-2 space-y-2">
          <textarea
            className={cn(inputClass, 'font-mono text-sm')}
            rows={6}
            value={pasted}
            onChange={(e) => setPasted(e.target.value)}
            aria-label="Pasted cut list"
            placeholder={'section\tlength\tquantity\tlabel\nT47100\t2400\t9\tstud'}
          />
          <Button
            variant="secondary"
            disabled={busy || pasted.trim() === ''}
            onClick={() => send(pasted, 'the pasted rows')}
          >
            Import pasted rows
          </Button>
        </div>
      </details>
      {outcome?.kind === 'done' && <Notice data-testid="import-done">{outcome.text}</Notice>}
      {outcome?.kind === 'errors' && (
        <div className="grid gap-4 md:grid-cols-[1fr_16rem]">
          <ImportErrors summary={outcome.summary} errors={outcome.errors} />
          {outcome.errors.some((e) => e.column === 'section') && sections.data && (
            <section className="rounded-lg border-2 border-grain bg-white p-3" data-testid="valid-sections">
              <h3 className="font-semibold">Sections this yard cuts</h3>
              <ul className="mt-1 space-y-0.5 text-sm">
                {sections.data.map((s) => (
                  <li key={s.id}>
                    <span className="font-mono font-semibold">{s.code}</span> {s.name}
                  </li>
                ))}
              </ul>
            </section>
          )}
        </div>
      )}
    </div>
  );
}
