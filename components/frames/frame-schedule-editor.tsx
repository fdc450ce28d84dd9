'use client';

import { useRouter } from 'next/navigation';
import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { layoutPanel, type SectionDimensions } from '@/lib/frames';
import type { FrameSectionOption } from '@/lib/frames-data/frame-section-option';
import type { FrameContext } from '@/lib/frames/types';
import {
  copyFrameScheduleRequest,
  deleteFrameScheduleRequest,
  saveFrameScheduleRequest,
  type FrameScheduleDto,
} from '@/lib/queries/frames';
import { AddPanelBar } from './add-panel-bar';
import { PanelCard } from './panel-card';
import { draftToPanel, newPanelDraft, panelToDraft, reformatLengths, type PanelDraft } from './panel-draft';
import { PieceScheduleTable } from './piece-schedule-table';
import { ScheduleDetailsFields, type ScheduleDetails } from './schedule-details';
import { SendToJobForm, type OpenJob } from './send-to-job-form';
import { StructureNotice } from './structure-notice';
import { panelIssues, useFramePreview } from './use-frame-preview';
import { useUnsavedWarning } from './use-unsaved-warning';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

type Props = {
  schedule: FrameScheduleDto;
  sections: FrameSectionOption[];
  openJobs: OpenJob[];
  /** The yard's framing habits, so the drawings name and count pieces as the cut list does. */
  rules: Pick<FrameContext, 'region' | 'minPieceMm'>;
};

/** The frame schedule editor: panels with live drawings, the piece schedule, save, copy and send to a job. */
export function FrameScheduleEditor({ schedule, sections, openJobs, rules }: Props) {
  const router = useRouter();
  const [details, setDetails] = useState<ScheduleDetails>({
    name: schedule.name,
    customerName: schedule.customerName,
    customerEmail: schedule.customerEmail,
    unit: schedule.unit,
  });
  const [drafts, setDrafts] = useState<PanelDraft[]>(() =>
    schedule.panels.map((p, k) => panelToDraft(p, schedule.unit, p.id ?? `p${k + 1}`)),
  );
  const converted = drafts.map(draftToPanel);
  const body = { ...details, panels: converted.map((c) => c.panel) };
  const bodyKey = JSON.stringify(body);
  const [savedKey, setSavedKey] = useState(bodyKey);
  const clientErrors = converted.some((c) => Object.keys(c.errors).length > 0);
  const preview = useFramePreview(
    drafts.length && !clientErrors ? { unit: details.unit, panels: body.panels } : null,
  );
  const previewIssues = panelIssues(preview.error);

  const save = useApiMutation({
    mutationFn: () => saveFrameScheduleRequest(schedule.id, body),
    onSuccess: () => {
      setSavedKey(bodyKey);
      router.refresh();
    },
  });
  const saveIssues = panelIssues(save.error);
  const copy = useApiMutation({
    mutationFn: () => copyFrameScheduleRequest(schedule.id),
    onSuccess: (s) => router.push(`/frames/${s.id}`),
  });
  const remove = useApiMutation({
    mutationFn: () => deleteFrameScheduleRequest(schedule.id),
    onSuccess: () => router.push('/frames'),
  });
  const dirty = bodyKey !== savedKey;
  useUnsavedWarning(dirty && !remove.isSuccess && !copy.isPending);

  // A new first panel starts on a framing size rather than whatever sorts first.
  const framingSectionId = (sections.find((s) => s.thickness >= 38 && s.width >= 75) ?? sections[0])?.id;
  const claddingSectionId = (
    sections.find((s) => /cladding|shiplap|weatherboard|tongue|t&g|featherboard/i.test(s.name)) ??
    sections.find((s) => s.thickness <= 25 && s.width >= 100)
  )?.id;
  const dimensions = useMemo(
    () =>
      new Map<number, SectionDimensions>(
        sections.map((s) => [s.id, { thickness: s.thickness, width: s.width }]),
      ),
    [sections],
  );
  const layouts = useMemo(() => {
    const panels = preview.data?.panels ?? [];
    return panels.map((panel) => layoutPanel(panel, { ...rules, sections: dimensions, panels }));
  }, [preview.data, dimensions, rules]);

  const update = (index: number, draft: PanelDraft) =>
    setDrafts((ds) => ds.map((d, k) => (k === index ? draft : d)));
  const move = (index: number, by: -1 | 1) =>
    setDrafts((ds) => {
      const next = [...ds];
      [next[index], next[index + by]] = [next[index + by], next[index]];
      return next;
    });
  const setUnit = (next: ScheduleDetails) => {
    if (next.unit !== details.unit) setDrafts((ds) => ds.map((d) => reformatLengths(d, next.unit)));
    setDetails(next);
  };
  const errorsFor = (index: number) => ({
    ...previewIssues.byPanel[index],
    ...saveIssues.byPanel[index],
    ...converted[index].errors,
  });

  return (
    <div className="space-y-6">
      <StructureNotice />
      <Card className="space-y-4">
        <ScheduleDetailsFields value={details} errors={saveIssues.top} onChange={setUnit} />
        <div className="flex flex-wrap items-center gap-2">
          <Button onClick={() => save.mutate()} disabled={save.isPending || !dirty}>
            {save.isPending ? 'Saving…' : 'Save schedule'}
          </Button>
          <Button variant="secondary" onClick={() => copy.mutate()} disabled={copy.isPending}>
            Copy
          </Button>
          <Button
            variant="quiet"
            className="text-brick"
            onClick={() => confirm('Delete this frame schedule?') && remove.mutate()}
          >
            Delete
          </Button>
          <span className="text-sm text-bark-soft" data-testid="save-state">
            {dirty ? 'Unsaved changes' : 'All changes saved'}
          </span>
        </div>
        {save.error && (
          <Notice tone="error">
            {saveIssues.count ? 'Not saved: the marked fields need attention.' : save.error.message}
          </Notice>
        )}
        {copy.error && <Notice tone="error">{copy.error.message}</Notice>}
        {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
      </Card>

      <section className="space-y-4" aria-label="Panels">
        <h2 className="text-xl font-bold">Panels</h2>
        {drafts.length === 0 && (
          <p className="text-bark-soft">
            No panels yet. Start with a wall, then add its openings, the roof and any doors.
          </p>
        )}
        {drafts.map((draft, index) => (
          <PanelCard
            key={draft.key}
            index={index}
            count={drafts.length}
            draft={draft}
            drafts={drafts}
            sections={sections}
            unit={details.unit}
            errors={errorsFor(index)}
            layout={layouts[index] ?? null}
            onChange={(d) => update(index, d)}
            onMove={(by) => move(index, by)}
            onRemove={() => setDrafts((ds) => ds.filter((_, k) => k !== index))}
          />
        ))}
        <AddPanelBar
          onAdd={(kind) =>
            setDrafts((ds) => [
              ...ds,
              newPanelDraft(kind, ds, framingSectionId, details.unit, claddingSectionId),
            ])
          }
        />
      </section>

      <Card className="space-y-3" data-testid="cut-list">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 className="text-xl font-bold">Piece schedule</h2>
          <span className="text-sm text-bark-soft" data-testid="preview-state">
            {clientErrors
              ? 'Fix the marked lengths to update'
              : preview.waiting
                ? 'Updating…'
                : preview.error
                  ? 'Fix the marked fields to update'
                  : 'Up to date'}
          </span>
        </div>
        {preview.error && (
          <Notice tone="error">
            {previewIssues.count ? (
              <ul className="list-inside list-disc" data-testid="preview-issues">
                {Object.values(previewIssues.top).map((m) => (
                  <li key={m}>{m}</li>
                ))}
                {Object.entries(previewIssues.byPanel).flatMap(([k, fields]) =>
                  Object.values(fields).map((m) => (
                    <li
                      key={`${k}${m}`}
                    >{`Panel ${Number(k) + 1} (${drafts[Number(k)]?.name ?? ''}): ${m}`}</li>
                  )),
                )}
              </ul>
            ) : (
              preview.error.message
            )}
          </Notice>
        )}
        {preview.data?.warnings.map((w) => (
          <Notice key={w} tone="warning">
            {w}
          </Notice>
        ))}
        {preview.data && drafts.length > 0 ? (
          <PieceScheduleTable items={preview.data.items} sections={sections} unit={details.unit} />
        ) : (
          <p className="text-bark-soft">Add a panel to see its pieces.</p>
        )}
      </Card>

      <Card className="space-y-3">
        <h2 className="text-xl font-bold">Send to a job</h2>
        {schedule.jobs.length > 0 && (
          <p className="text-sm">
            Jobs from this schedule:{' '}
            {schedule.jobs.map((j) => (
              <a key={j.id} className="mr-2 font-semibold text-spruce underline" href={`/jobs/${j.id}`}>
                {j.reference}
              </a>
            ))}
          </p>
        )}
        {dirty && <p className="text-sm text-bark-soft">Unsaved changes are saved first.</p>}
        <SendToJobForm
          scheduleId={schedule.id}
          customerName={details.customerName}
          customerEmail={details.customerEmail}
          openJobs={openJobs}
          disabled={drafts.length === 0 || clientErrors || Boolean(preview.error)}
          beforeSend={async () => {
            if (dirty) await save.mutateAsync();
          }}
        />
      </Card>
    </div>
  );
}
