'use client';

import { Button } from '@/components/ui/button';
import { KIND_HINTS, KIND_NAMES, type PanelKind } from './panel-fields';

const KINDS: PanelKind[] = [
  'wall',
  'sloped_wall',
  'opening',
  'roof',
  'base',
  'door_leaf',
  'cladding',
  'free',
];

/** One button per kind of panel; an opening, door leaf or cladding attaches to the last wall or opening. */
export function AddPanelBar({ onAdd }: { onAdd: (kind: PanelKind) => void }) {
  return (
    <div className="rounded-xl border-2 border-dashed border-grain p-4" data-testid="add-panel">
      <h3 className="mb-3 font-semibold">Add a panel</h3>
      <div className="flex flex-wrap gap-2">
        {KINDS.map((kind) => (
          <Button key={kind} variant="secondary" title={KIND_HINTS[kind]} onClick={() => onAdd(kind)}>
            + {KIND_NAMES[kind]}
          </Button>
        ))}
      </div>
    </div>
  );
}
