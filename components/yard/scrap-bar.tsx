'use client';

import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { scrapOffcutsRequest } from '@/lib/queries/offcuts';

/** Actions on the chosen offcuts: scrap with a reason, reprint their labels. */
export function ScrapBar({
  ids,
  canEdit,
  onDone,
  onError,
}: {
  ids: number[];
  canEdit: boolean;
  onDone: (message: string) => void;
  onError: (m: string | null) => void;
}) {
  const queryClient = useQueryClient();
  const [reason, setReason] = useState('');
  const scrap = useMutation({
    mutationFn: () => scrapOffcutsRequest(ids, reason),
    onSuccess: (r) => {
      setReason('');
      onError(null);
      onDone(`Scrapped ${r.scrapped} offcut${r.scrapped === 1 ? '' : 's'}.`);
      return queryClient.invalidateQueries({ queryKey: ['offcuts'] });
    },
    onError: (e) => onError(e.message),
  });
  return (
    <div className="flex flex-wrap items-end gap-2 rounded-lg bg-amber-light p-3" data-testid="scrap-bar">
      <span className="self-center font-semibold">{ids.length} chosen</span>
      <a
        className="inline-flex min-h-11 items-center rounded-lg border-2 border-grain bg-white px-4 font-semibold text-bark"
        href={`/labels/offcuts?ids=${ids.join(',')}`}
        target="_blank"
        rel="noreferrer"
      >
        Reprint labels
      </a>
      {canEdit && (
        <form
          className="flex flex-wrap gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            scrap.mutate();
          }}
        >
          <input
            aria-label="Reason for scrapping"
            className={`${inputClass} w-64`}
            value={reason}
            onChange={(e) => setReason(e.target.value)}
            placeholder="Reason, e.g. split, too old"
          />
          <Button type="submit" variant="danger" disabled={scrap.isPending || !reason.trim()}>
            Scrap chosen
          </Button>
        </form>
      )}
    </div>
  );
}
