'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { moveOffcutsRequest, scrapOffcutsRequest } from '@/lib/queries/offcuts';
import { offcutKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

const plural = (n: number) => `${n} offcut${n === 1 ? '' : 's'}`;

/** Actions on the chosen offcuts: move them to one rack location, scrap with a reason, reprint labels. */
export function ChosenOffcutsBar({
  ids,
  canEdit,
  locations,
  onDone,
  onError,
}: {
  ids: number[];
  canEdit: boolean;
  /** Rack locations already in use, offered as suggestions. */
  locations: string[];
  onDone: (message: string) => void;
  onError: (m: string | null) => void;
}) {
  const [reason, setReason] = useState('');
  const [location, setLocation] = useState('');
  const scrap = useApiMutation({
    mutationFn: () => scrapOffcutsRequest(ids, reason),
    invalidates: [offcutKeys.all],
    onSuccess: (r) => {
      setReason('');
      onError(null);
      onDone(`Scrapped ${plural(r.scrapped)}.`);
    },
    onError: (e) => onError(e.message),
  });
  const move = useApiMutation({
    mutationFn: () => moveOffcutsRequest(ids, location.trim()),
    invalidates: [offcutKeys.all],
    onSuccess: (r) => {
      setLocation('');
      onError(null);
      const stayed = r.offcuts.length - r.moved;
      onDone(
        `Moved ${plural(r.moved)} to ${location.trim()}.` +
          (stayed > 0 ? ` ${plural(stayed)} already there.` : ''),
      );
    },
    onError: (e) => onError(e.message),
  });
  return (
    <div
      className="flex flex-wrap items-center gap-3 rounded-lg bg-amber-light p-3"
      data-testid="chosen-offcuts-bar"
    >
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
          className="flex items-center gap-2"
          data-testid="move-chosen"
          onSubmit={(e) => {
            e.preventDefault();
            move.mutate();
          }}
        >
          {/* The control is full width by default: its box sets the width. */}
          <div className="w-48">
            <input
              aria-label="Move the chosen offcuts to"
              className={inputClass}
              list="rack-locations"
              value={location}
              onChange={(e) => setLocation(e.target.value)}
              placeholder="Rack location"
            />
          </div>
          <datalist id="rack-locations">
            {locations.map((l) => (
              <option key={l} value={l} />
            ))}
          </datalist>
          <Button type="submit" variant="secondary" disabled={move.isPending || !location.trim()}>
            {move.isPending ? 'Moving…' : 'Move chosen'}
          </Button>
        </form>
      )}
      {canEdit && (
        <form
          className="flex items-center gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            scrap.mutate();
          }}
        >
          <div className="w-64">
            <input
              aria-label="Reason for scrapping"
              className={inputClass}
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              placeholder="Reason, e.g. split, too old"
            />
          </div>
          <Button type="submit" variant="danger" disabled={scrap.isPending || !reason.trim()}>
            Scrap chosen
          </Button>
        </form>
      )}
    </div>
  );
}
