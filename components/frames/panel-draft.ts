import type { FrameSchedulePanel, FrameSchedulePanelInput } from '@/lib/frames';
import type { DisplayUnit } from '@/lib/units';
import { formatLength, parseLength } from '@/lib/units';
import { NEW_PANEL_VALUES, PANEL_FIELDS, type PanelKind } from './panel-fields';

/** A panel as the form holds it: every value as typed text; `exact` keeps stored millimetres until edited. */
export type PanelDraft = {
  key: string;
  kind: PanelKind;
  id: string;
  name: string;
  values: Record<string, string>;
  exact: Record<string, number>;
};

const toText = (value: unknown, type: string, unit: DisplayUnit): string => {
  if (value === undefined || value === null) return '';
  if (type === 'yesno') return value ? 'yes' : 'no';
  if (type === 'length' && typeof value === 'number') return formatLength(value, unit);
  return String(value);
};

export function panelToDraft(
  panel: FrameSchedulePanel | (Record<string, unknown> & { kind: PanelKind }),
  unit: DisplayUnit,
  key: string,
): PanelDraft {
  const record = panel as Record<string, unknown>;
  const values: Record<string, string> = {};
  const exact: Record<string, number> = {};
  for (const field of PANEL_FIELDS[panel.kind]) {
    values[field.key] = toText(record[field.key], field.type, unit);
    if (field.type === 'length' && typeof record[field.key] === 'number')
      exact[field.key] = record[field.key] as number;
  }
  return {
    key,
    kind: panel.kind,
    id: String(record.id ?? key),
    name: String(record.name ?? ''),
    values,
    exact,
  };
}

const NEW_NAMES: Record<PanelKind, string> = {
  wall: 'wall',
  sloped_wall: 'side wall',
  opening: 'door opening',
  roof: 'roof',
  base: 'base',
  door_leaf: 'door',
  cladding: 'cladding',
  free: 'extras',
};

/** A new panel with working values: the last panel's section, and the last wall or opening to sit in. */
export function newPanelDraft(
  kind: PanelKind,
  drafts: PanelDraft[],
  fallbackSectionId: number | undefined,
  unit: DisplayUnit,
  /** Cladding starts on a cladding board, not on the framing section above it. */
  claddingSectionId?: number,
): PanelDraft {
  let n = drafts.length + 1;
  const ids = new Set(drafts.map((d) => d.id));
  while (ids.has(`p${n}`)) n++;
  const id = `p${n}`;
  const lastWith = (kinds: PanelKind[]) => [...drafts].reverse().find((d) => kinds.includes(d.kind));
  const fallback = kind === 'cladding' ? (claddingSectionId ?? fallbackSectionId) : fallbackSectionId;
  const sectionId =
    [...drafts].reverse().find((d) => d.values.sectionId && (kind === 'cladding') === (d.kind === 'cladding'))
      ?.values.sectionId ?? (fallback ? String(fallback) : '');
  const sameKind = drafts.filter((d) => d.kind === kind).length;
  const values: Record<string, unknown> = {
    ...NEW_PANEL_VALUES[kind],
    id,
    name: sameKind ? `${NEW_NAMES[kind]} ${sameKind + 1}` : NEW_NAMES[kind],
  };
  if (kind !== 'opening') values.sectionId = sectionId ? Number(sectionId) : undefined;
  if (kind === 'door_leaf') values.boardSectionId = values.sectionId;
  if (kind === 'opening' || kind === 'cladding') values.wallId = lastWith(['wall', 'sloped_wall'])?.id;
  if (kind === 'door_leaf') values.openingId = lastWith(['opening'])?.id;
  return panelToDraft({ kind, ...values }, unit, id);
}

/** The panel the API takes, plus messages for fields that could not be read. Blank optional fields are left out. */
export function draftToPanel(draft: PanelDraft): {
  panel: FrameSchedulePanelInput;
  errors: Record<string, string>;
} {
  const out: Record<string, unknown> = { kind: draft.kind, id: draft.id, name: draft.name };
  const errors: Record<string, string> = {};
  for (const field of PANEL_FIELDS[draft.kind]) {
    const text = (draft.values[field.key] ?? '').trim();
    if (text === '') continue;
    if (field.type === 'length') {
      if (draft.exact[field.key] !== undefined) out[field.key] = draft.exact[field.key];
      else {
        const parsed = parseLength(text);
        if (parsed.ok) out[field.key] = parsed.mm;
        else errors[field.key] = parsed.message;
      }
    } else if (field.type === 'number' || field.type === 'section') {
      const value = Number(text);
      if (Number.isFinite(value)) out[field.key] = value;
      else errors[field.key] = `${field.label} must be a number`;
    } else if (field.type === 'yesno') out[field.key] = text === 'yes';
    else out[field.key] = text;
  }
  return { panel: out as FrameSchedulePanelInput, errors };
}

/** Shows every readable length in the new unit; stored millimetres stay exact. */
export function reformatLengths(draft: PanelDraft, unit: DisplayUnit): PanelDraft {
  const values = { ...draft.values };
  const exact = { ...draft.exact };
  for (const field of PANEL_FIELDS[draft.kind]) {
    if (field.type !== 'length' || !values[field.key]?.trim()) continue;
    const parsed = parseLength(values[field.key]);
    const mm = exact[field.key] ?? (parsed.ok ? parsed.mm : undefined);
    if (mm === undefined) continue;
    exact[field.key] = mm;
    values[field.key] = formatLength(mm, unit);
  }
  return { ...draft, values, exact };
}
