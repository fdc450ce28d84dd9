'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card, cardClass } from '@/components/ui/field';
import type { DisplayUnit, Region } from '@/db/enums';
import { stockLengthName } from '@/lib/units/stock-length-name';
import { formatPence } from '@/lib/format/money';
import type { SectionRow } from '@/lib/queries/stock';
import { SectionEditor } from './section-editor';
import { MOISTURE_LABEL } from './section-trade-fields';
import { lengthText, marginText, onHandText } from './stock-length-label';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';

/** The sections the yard sells. The owner edits; everyone else reads. */
export function SectionsCatalogue({
  sections,
  unit,
  region,
  canEdit,
}: {
  sections: SectionRow[];
  unit: DisplayUnit;
  region: Region;
  canEdit: boolean;
}) {
  const [editing, setEditing] = useState<SectionRow | 'new' | null>(null);
  return (
    <div className="space-y-4">
      {canEdit && editing === null && (
        <Button variant="secondary" onClick={() => setEditing('new')}>
          Add a section
        </Button>
      )}
      {editing !== null && (
        <Card>
          <SectionEditor
            key={editing === 'new' ? 'new' : editing.id}
            section={editing === 'new' ? null : editing}
            onClose={() => setEditing(null)}
          />
        </Card>
      )}
      <ScrollRegion label="Sections" className={cn(cardClass, 'p-0')}>
        <table className="w-full text-left" data-testid="sections-table">
          <thead className="bg-shaving text-sm">
            <tr>
              <th className="p-3">Section</th>
              <th className="p-3">Timber</th>
              <th className="p-3">Stock lengths (price, on hand)</th>
              {canEdit && (
                <th className="p-3">
                  <span className="sr-only">Edit</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {sections.map((s) => (
              <tr
                key={s.id}
                className={`border-t border-shaving align-top ${s.active ? '' : 'opacity-60'}`}
                data-testid={`section-row-${s.code}`}
              >
                <td className="p-3">
                  <div className="font-semibold">{s.name}</div>
                  <div className="text-sm text-bark-soft">
                    {s.thicknessMm} × {s.widthMm} mm
                    {s.finishedThicknessMm || s.finishedWidthMm
                      ? ` (finished ${s.finishedThicknessMm ?? s.thicknessMm} × ${s.finishedWidthMm ?? s.widthMm})`
                      : ''}{' '}
                    · {s.code}
                    {s.active ? '' : ' · not sold'}
                  </div>
                </td>
                <td className="p-3 text-sm">
                  {[
                    s.species,
                    s.grade,
                    s.finish === 'planed' ? 'planed' : 'sawn',
                    MOISTURE_LABEL[s.moisture],
                    s.treatment,
                    s.minKeepMm ? `keeps offcuts from ${lengthText(s.minKeepMm, unit)}` : '',
                    s.nominalToleranceMm !== null
                      ? `nominal pieces up to ${s.nominalToleranceMm} mm short`
                      : '',
                  ]
                    .filter(Boolean)
                    .join(' · ')}
                </td>
                <td className="p-3">
                  <ul className="flex flex-wrap gap-2 text-sm">
                    {s.lengths.map((l) => (
                      <li
                        key={l.id}
                        className={`rounded-md px-2 py-1 ${l.onHand === 0 ? 'bg-brick-light text-brick' : 'bg-shaving'} ${l.active ? '' : 'line-through'}`}
                        data-testid={`stock-length-${l.id}`}
                      >
                        <span className="font-semibold">{stockLengthName(l.lengthMm, region)}</span> ·{' '}
                        {formatPence(l.pricePence)}
                        {l.costPence !== null &&
                          ` (cost ${formatPence(l.costPence)}, ${marginText(l)})`} · {onHandText(l)}
                      </li>
                    ))}
                  </ul>
                </td>
                {canEdit && (
                  <td className="p-3">
                    <Button variant="quiet" onClick={() => setEditing(s)} aria-label={`Edit ${s.name}`}>
                      Edit
                    </Button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
