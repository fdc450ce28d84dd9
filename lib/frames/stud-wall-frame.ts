import { parallelCutBlank, rectangle, roundAngle, toDegrees } from './geometry';
import type { FrameSchedulePanel, OpeningPanel, StudWallPanel } from './panel-schemas';
import { piece, type PanelBuild } from './panel-build';
import { getMemberCentres } from './stud-layout';
import type { FrameContext, FramePiece, Point } from './types';
import { getWallHeightAt } from './wall-height';
import { pieceName } from './piece-names';

type Vertical = { x0: number; x1: number; y0: number; minTop: number };
type OpeningZone = { opening: OpeningPanel; clearBottom: number; framedTop: number };

/**
 * A straight or mono-pitch stud wall with its openings: plates, studs, then for each opening
 * king studs, trimmers, head, cripples (and a sill below a window), then noggin rows.
 * Heights are measured from the underside of the wall (the floor); x from the wall's start.
 */
export function buildStudWallFrame(
  panels: FrameSchedulePanel[],
  wallIndex: number,
  ctx: FrameContext,
): PanelBuild {
  const wall = panels[wallIndex] as StudWallPanel;
  const warnings: string[] = [];
  const section = ctx.sections.get(wall.sectionId);
  if (!section)
    return { pieces: [], warnings: [`${wall.name}: section ${wall.sectionId} is unknown, panel skipped`] };
  const t = section.thickness;
  const L = wall.length;
  const rise = getWallHeightAt(wall, L) - getWallHeightAt(wall, 0);
  const slope = Math.atan2(rise, L);
  const plateDepth = t / Math.cos(slope); // vertical depth of a sloping plate
  const plates = (wall.topPlate ?? (ctx.region === 'uk' ? 'single' : 'double')) === 'double' ? 2 : 1;
  const base = wall.bottomPlate ? t : 0;
  const topAngle = rise !== 0 ? roundAngle(toDegrees(Math.abs(slope))) : undefined;
  const heightAt = (x: number) => getWallHeightAt(wall, x);
  const underPlate = (x: number) => heightAt(x) - plates * plateDepth;
  const pieces: FramePiece[] = [];
  const verticals: Vertical[] = [];
  const own = { panelIndex: wallIndex, drawingPanelIndex: wallIndex };

  // A vertical member from y0 up to the underside of the top plate; listed at its long point.
  const addToPlate = (
    at: typeof own,
    label: string,
    sectionId: number,
    x0: number,
    x1: number,
    y0: number,
    topGap = 0,
  ) => {
    const top0 = underPlate(x0) - topGap;
    const top1 = underPlate(x1) - topGap;
    const length = Math.max(top0, top1) - y0;
    if (length <= 0) return false;
    const outline: Point[] = [
      { x: x0, y: y0 },
      { x: x1, y: y0 },
      { x: x1, y: top1 },
      { x: x0, y: top0 },
    ];
    pieces.push(
      piece({
        ...at,
        label,
        sectionId,
        length,
        angle: topAngle,
        note: topAngle ? 'top cut' : undefined,
        outline,
      }),
    );
    verticals.push({ x0, x1, y0, minTop: Math.min(top0, top1) });
    return true;
  };

  const openings = panels
    .map((panel, index) => ({ panel, index }))
    .filter(
      (o): o is { panel: OpeningPanel; index: number } =>
        o.panel.kind === 'opening' && wall.id !== undefined && o.panel.wallId === wall.id,
    );

  // Plates: the bottom plate is left out across a door's clear width.
  if (wall.bottomPlate) {
    const doors = openings
      .filter((o) => o.panel.sillHeight === 0)
      .map((o) => o.panel)
      .sort((a, b) => a.position - b.position);
    let from = 0;
    for (const gap of [
      ...doors.map((d) => ({ start: d.position, end: d.position + d.width })),
      { start: L, end: L },
    ]) {
      if (gap.start > from)
        pieces.push(
          piece({
            ...own,
            label: `${wall.name} ${pieceName(ctx, 'bottom plate')}`,
            sectionId: wall.sectionId,
            length: gap.start - from,
            outline: rectangle(from, 0, gap.start, t),
          }),
        );
      from = Math.max(from, gap.end);
    }
  }
  for (let i = 0; i < plates; i++) {
    const outline = [
      { x: 0, y: heightAt(0) - (i + 1) * plateDepth },
      { x: L, y: heightAt(L) - (i + 1) * plateDepth },
      { x: L, y: heightAt(L) - i * plateDepth },
      { x: 0, y: heightAt(0) - i * plateDepth },
    ];
    // Plumb cuts at both ends are parallel: list the blank at its long point.
    const length = parallelCutBlank(Math.hypot(L, rise), t, toDegrees(Math.abs(slope)));
    pieces.push(
      piece({
        ...own,
        label: `${wall.name} ${pieceName(ctx, 'top plate')}`,
        sectionId: wall.sectionId,
        length,
        angle: topAngle,
        note: topAngle ? 'plumb cut both ends' : undefined,
        outline,
      }),
    );
  }

  // Studs at centres, except those in the way of an opening's framing.
  const centres = getMemberCentres(L, wall.centres, t);
  const zones: OpeningZone[] = [];
  const removed = new Set<number>();
  for (const { panel: o } of openings) {
    const ot = ctx.sections.get(o.sectionId ?? wall.sectionId)?.thickness ?? t;
    const start = o.position - ot - t;
    const end = o.position + o.width + ot + t;
    centres.forEach((c, k) => {
      if (k > 0 && k < centres.length - 1 && c + t / 2 > start && c - t / 2 < end) removed.add(k);
    });
  }
  centres.forEach((c, k) => {
    const added =
      !removed.has(k) && addToPlate(own, `${wall.name} stud`, wall.sectionId, c - t / 2, c + t / 2, base);
    // Square-topped common studs go out at nominal length (factory ends); angled tops are cut exact.
    if (added && !topAngle) pieces[pieces.length - 1].nominal = true;
  });

  for (const { panel: o, index } of openings) {
    const at = { panelIndex: index, drawingPanelIndex: wallIndex };
    const sectionId = o.sectionId ?? wall.sectionId;
    const headSectionId = o.headSectionId ?? sectionId;
    const ot = ctx.sections.get(sectionId)?.thickness;
    const headDepth = ctx.sections.get(headSectionId)?.width;
    if (ot === undefined || headDepth === undefined) {
      warnings.push(
        `${o.name}: section ${ot === undefined ? sectionId : headSectionId} is unknown, opening framing skipped`,
      );
      continue;
    }
    const left = o.position;
    const right = o.position + o.width;
    const top = o.sillHeight + o.height;
    if (left - ot < t || right + ot > L - t)
      warnings.push(
        `${o.name}: too close to the end of ${wall.name} for its trimmers; the end stud is shared`,
      );

    for (const kx of [left - ot - t, right + ot]) {
      if (kx >= t && kx + t <= L - t)
        addToPlate(at, `${o.name} ${pieceName(ctx, 'king stud')}`, wall.sectionId, kx, kx + t, base);
    }
    for (const tx of [left - ot, right]) {
      if (tx >= 0 && tx + ot <= L) {
        pieces.push(
          piece({
            ...at,
            label: `${o.name} ${pieceName(ctx, 'trimmer')}`,
            sectionId,
            length: top - base,
            outline: rectangle(tx, base, tx + ot, top),
          }),
        );
        verticals.push({ x0: tx, x1: tx + ot, y0: base, minTop: top });
      }
    }
    const headLeft = Math.max(0, left - ot);
    const headRight = Math.min(L, right + ot);
    pieces.push(
      piece({
        ...at,
        label: `${o.name} ${pieceName(ctx, 'head')}`,
        sectionId: headSectionId,
        length: headRight - headLeft,
        outline: rectangle(headLeft, top, headRight, top + headDepth),
      }),
    );
    if (top + headDepth > Math.min(underPlate(headLeft), underPlate(headRight)) + 0.5)
      warnings.push(`${o.name}: no room for the head below the top plate of ${wall.name}; lower the opening`);

    const cripplesAt = centres.filter((c) => c - ot / 2 >= left && c + ot / 2 <= right);
    for (const c of cripplesAt)
      addToPlate(
        at,
        `${o.name} ${pieceName(ctx, 'cripple above head')}`,
        sectionId,
        c - ot / 2,
        c + ot / 2,
        top + headDepth,
      );

    let clearBottom = 0;
    if (o.sillHeight > 0) {
      const sillBottom = o.sillHeight - ot;
      clearBottom = sillBottom;
      pieces.push(
        piece({
          ...at,
          label: `${o.name} sill`,
          sectionId,
          length: o.width,
          outline: rectangle(left, sillBottom, right, o.sillHeight),
        }),
      );
      if (sillBottom < base) warnings.push(`${o.name}: the sill is too low to fit above the bottom plate`);
      for (const c of cripplesAt) {
        if (sillBottom - base <= 0) break;
        pieces.push(
          piece({
            ...at,
            label: `${o.name} ${pieceName(ctx, 'cripple below sill')}`,
            sectionId,
            length: sillBottom - base,
            outline: rectangle(c - ot / 2, base, c + ot / 2, sillBottom),
          }),
        );
        verticals.push({ x0: c - ot / 2, x1: c + ot / 2, y0: base, minTop: sillBottom });
      }
    }
    zones.push({ opening: o, clearBottom, framedTop: top + headDepth });
  }

  addNoggins(wall, own, t, base, Math.min(underPlate(0), underPlate(L)), verticals, zones, pieces);
  return { pieces, warnings };
}

/** Noggin rows evenly spaced up the clear height, one noggin in each bay between members. */
function addNoggins(
  wall: StudWallPanel,
  own: { panelIndex: number; drawingPanelIndex: number },
  t: number,
  base: number,
  lowestTop: number,
  verticals: Vertical[],
  zones: OpeningZone[],
  pieces: FramePiece[],
) {
  for (let row = 1; row <= wall.nogginRows; row++) {
    const y = base + (row * (lowestTop - base)) / (wall.nogginRows + 1);
    const across = verticals
      .filter((v) => v.y0 <= y - t / 2 && v.minTop >= y + t / 2)
      .sort((a, b) => a.x0 - b.x0);
    for (let k = 0; k + 1 < across.length; k++) {
      const x0 = across[k].x1;
      const x1 = across[k + 1].x0;
      if (x1 - x0 < 1) continue;
      const mid = (x0 + x1) / 2;
      const inOpening = zones.some(
        (z) =>
          mid > z.opening.position &&
          mid < z.opening.position + z.opening.width &&
          y > z.clearBottom &&
          y < z.framedTop,
      );
      if (inOpening) continue;
      pieces.push(
        piece({
          ...own,
          label: `${wall.name} noggin`,
          sectionId: wall.sectionId,
          length: x1 - x0,
          outline: rectangle(x0, y - t / 2, x1, y + t / 2),
        }),
      );
    }
  }
}
