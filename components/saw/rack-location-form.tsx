'use client';
// Change where a new offcut is racked before printing its label (screen only, never printed).
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { moveOffcutsRequest } from '@/lib/queries/offcuts';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

export function RackLocationForm({ offcutId, location }: { offcutId: number; location: string }) {
  const router = useRouter();
  const [value, setValue] = useState(location);
  const move = useApiMutation({
    mutationFn: () => moveOffcutsRequest([offcutId], value.trim()),
    onSuccess: () => router.refresh(),
  });
  return (
    <form
      className="no-print mt-2 grid max-w-[62mm] grid-cols-[1fr_auto] gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        move.mutate();
      }}
    >
      <label className="sr-only" htmlFor={`loc-${offcutId}`}>
        Rack location
      </label>
      <input
        id={`loc-${offcutId}`}
        value={value}
        onChange={(e) => setValue(e.target.value)}
        className="min-h-12 min-w-0 rounded-lg border-2 border-grain px-2 text-base"
      />
      <button
        type="submit"
        className="min-h-12 rounded-lg border-2 border-spruce px-3 font-semibold text-spruce"
        disabled={move.isPending || !value.trim()}
      >
        Set place
      </button>
      {move.error && (
        <span className="col-span-2 text-sm font-semibold text-brick">{move.error.message}</span>
      )}
    </form>
  );
}
