'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { inputClass } from '@/components/ui/field';
import { moveOffcutsRequest, type OffcutRow } from '@/lib/queries/offcuts';
import { offcutKeys } from '@/lib/queries/query-keys';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Shows an offcut's rack location; the yard hand and owner can move it. */
export function OffcutLocationCell({
  offcut,
  canEdit,
  onError,
}: {
  offcut: OffcutRow;
  canEdit: boolean;
  onError: (m: string | null) => void;
}) {
  const [editing, setEditing] = useState(false);
  const [location, setLocation] = useState(offcut.location);
  const move = useApiMutation({
    mutationFn: () => moveOffcutsRequest([offcut.id], location.trim()),
    invalidates: [offcutKeys.all],
    onSuccess: () => {
      onError(null);
      setEditing(false);
    },
    onError: (e) => onError(e.message),
  });
  const onRack = offcut.status === 'available' || offcut.status === 'reserved';
  if (!editing) {
    return (
      <span className="flex items-center gap-2">
        {offcut.location || '—'}
        {canEdit && onRack && (
          <button
            type="button"
            className="text-sm font-semibold text-spruce underline"
            onClick={() => setEditing(true)}
            aria-label={`Move ${offcut.tag}`}
          >
            Move
          </button>
        )}
      </span>
    );
  }
  return (
    <form
      className="flex gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        move.mutate();
      }}
    >
      <input
        aria-label={`New location of ${offcut.tag}`}
        className={`${inputClass} w-32 text-sm`}
        value={location}
        onChange={(e) => setLocation(e.target.value)}
        autoFocus
      />
      <Button type="submit" variant="secondary" disabled={move.isPending || !location.trim()}>
        Save
      </Button>
    </form>
  );
}
