'use client';

import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import type { PanelLayout } from '@/lib/frames';
import type { FrameSectionOption } from '@/lib/frames-data/frame-section-option';
import type { DisplayUnit } from '@/lib/units';
import { formatLength } from '@/lib/units';
import { PanelElevation } from './panel-elevation';
import type { PanelDraft } from './panel-draft';
import { KIND_NAMES } from './panel-fields';
import { PanelForm } from './panel-form';

type Props = {
  index: number;
  count: number;
  draft: PanelDraft;
  drafts: PanelDraft[];
  sections: FrameSectionOption[];
  unit: DisplayUnit;
  errors: Record<string, string>;
  layout: PanelLayout | null;
  onChange: (draft: PanelDraft) => void;
  onMove: (by: -1 | 1) => void;
  onRemove: () => void;
};

/** One panel: its form beside its to-scale drawing, numbered as its pieces' marks are. */
export function PanelCard({ index, count, draft, layout, onMove, onRemove, ...form }: Props) {
  const wall = draft.kind === 'opening' ? form.drafts.find((d) => d.id === draft.values.wallId) : undefined;
  return (
    <Card
      className="space-y-4"
      data-testid={`panel-card-${index}`}
      aria-label={`Panel ${index + 1}: ${draft.name}`}
      role="group"
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-lg font-bold">
          <span className="mr-2 rounded bg-bark px-2 py-0.5 text-white">{index + 1}</span>
          {draft.name || 'Unnamed panel'}{' '}
          <span className="font-normal text-bark-soft">· {KIND_NAMES[draft.kind]}</span>
        </h3>
        <div className="flex gap-1">
          <Button
            variant="quiet"
            onClick={() => onMove(-1)}
            disabled={index === 0}
            aria-label={`Move ${draft.name} up`}
          >
            ↑
          </Button>
          <Button
            variant="quiet"
            onClick={() => onMove(1)}
            disabled={index === count - 1}
            aria-label={`Move ${draft.name} down`}
          >
            ↓
          </Button>
          <Button
            variant="quiet"
            className="text-brick"
            onClick={onRemove}
            aria-label={`Remove ${draft.name}`}
          >
            Remove
          </Button>
        </div>
      </div>
      <div className="grid gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <PanelForm draft={draft} {...form} onChange={form.onChange} />
        <div className="min-h-40 rounded-lg border border-shaving bg-sawdust p-2">
          {layout && layout.shapes.length > 0 ? (
            <PanelElevation
              layout={{
                ...layout,
                dimensions: layout.dimensions.map((d) => ({ ...d, text: formatLength(d.value, form.unit) })),
              }}
              className="h-auto max-h-[28rem] w-full"
            />
          ) : (
            <p className="p-4 text-sm text-bark-soft">
              {draft.kind === 'opening'
                ? `Drawn on ${wall?.name ?? 'its wall'}; its pieces are marked ${index + 1}.n in the schedule.`
                : draft.kind === 'free'
                  ? 'Loose pieces have no drawing.'
                  : 'The drawing appears when the panel’s sizes are complete.'}
            </p>
          )}
        </div>
      </div>
    </Card>
  );
}
