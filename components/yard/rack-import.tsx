'use client';

import { useState } from 'react';
import { useDropzone } from 'react-dropzone';
import { Notice } from '@/components/ui/notice';
import { OFFCUT_RACK_TEMPLATE_CSV, type ImportError } from '@/lib/cut-lists';
import { ApiError } from '@/lib/queries/fetch-json';
import { importOffcutsRequest } from '@/lib/queries/offcuts';
import { offcutKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Enters an existing rack from a CSV file: all rows or none, with every bad row listed. */
export function RackImport() {
  const [fileName, setFileName] = useState<string | null>(null);
  const upload = useApiMutation({ mutationFn: importOffcutsRequest, invalidates: [offcutKeys.all] });
  const { getRootProps, getInputProps, isDragActive } = useDropzone({
    accept: { 'text/csv': ['.csv'], 'text/plain': ['.txt'] },
    multiple: false,
    onDrop: async ([file]) => {
      if (!file) return;
      setFileName(file.name);
      upload.mutate(await file.text());
    },
  });
  const rowErrors =
    upload.error instanceof ApiError
      ? ((upload.error.body as { details?: { errors?: ImportError[] } })?.details?.errors ?? [])
      : [];
  const template = `data:text/csv;charset=utf-8,${encodeURIComponent(OFFCUT_RACK_TEMPLATE_CSV)}`;

  return (
    <div className="space-y-3" data-testid="rack-import">
      <div
        {...getRootProps({
          className: `cursor-pointer rounded-lg border-2 border-dashed p-6 text-center ${isDragActive ? 'border-spruce bg-spruce-light' : 'border-grain'}`,
        })}
      >
        <input {...getInputProps()} aria-label="Rack CSV file" />
        <p className="font-semibold">Drop a rack CSV here, or click to choose one</p>
        <p className="text-sm text-bark-soft">
          Columns: section, length, location, tag (optional).{' '}
          <a
            href={template}
            download="offcut-rack-template.csv"
            className="underline"
            onClick={(e) => e.stopPropagation()}
          >
            Download a template
          </a>
        </p>
      </div>
      {upload.isPending && <p>Reading {fileName}…</p>}
      {upload.data && (
        <Notice data-testid="import-done">
          Added {upload.data.imported} offcuts from {fileName}.
        </Notice>
      )}
      {upload.error && (
        <Notice tone="error">
          <p>{upload.error.message}</p>
          {rowErrors.length > 0 && (
            <ul className="mt-2 list-disc pl-5 text-sm">
              {rowErrors.slice(0, 50).map((e, i) => (
                <li key={i}>
                  Line {e.line}
                  {e.column ? `, ${e.column}` : ''}: {e.message}
                </li>
              ))}
              {rowErrors.length > 50 && <li>…and {rowErrors.length - 50} more.</li>}
            </ul>
          )}
        </Notice>
      )}
    </div>
  );
}
