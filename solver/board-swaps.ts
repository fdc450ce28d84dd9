// Cheap improving moves on a finished plan, for several board kinds: cut each board's pieces from
// the cheapest board that still holds them (least scrap on ties), and merge two part-empty boards
// into one when a single board holds both. Each move lowers cost or scrap, never breaks a rule.

import { boardFits } from './board-fit';
import type { Model } from './model';
import { boardScrap, makeBoard, type PackedBoard, type Packing } from './packing';

export function downsizeBoards(model: Model, packing: Packing): Packing {
  const left = model.bins.map((b) => b.limit);
  for (const b of packing.boards) left[b.bin]--;
  const boards = packing.boards.map((b) => ({ ...b }));
  const order = boards
    .map((_, k) => k)
    .sort(
      (x, y) =>
        model.bins[boards[y].bin].cost - model.bins[boards[x].bin].cost ||
        boards[y].load - boards[x].load ||
        x - y,
    );
  for (const k of order) {
    const board = boards[k];
    left[board.bin]++;
    let pick = board.bin;
    let pickScrap = boardScrap(model, board);
    model.bins.forEach((bin, j) => {
      if (left[j] <= 0 || !boardFits(model, j, board.items)) return;
      const cost = bin.costUnits;
      const scrap = boardScrap(model, { bin: j, items: board.items, load: board.load });
      const pc = model.bins[pick].costUnits;
      if (cost < pc || (cost === pc && scrap < pickScrap)) {
        pick = j;
        pickScrap = scrap;
      }
    });
    left[pick]--;
    board.bin = pick;
  }
  return { boards, unplaced: packing.unplaced };
}

export function mergeBoards(model: Model, packing: Packing, maxCandidates: number): Packing {
  const left = model.bins.map((b) => b.limit);
  for (const b of packing.boards) left[b.bin]--;
  let boards: (PackedBoard | null)[] = packing.boards.map((b) => ({ ...b }));
  const emptiest = boards
    .map((b, k) => k)
    .sort((x, y) => boards[x]!.load - boards[y]!.load || x - y)
    .slice(0, maxCandidates);
  for (let i = 0; i < emptiest.length; i++) {
    for (let j = i + 1; j < emptiest.length; j++) {
      const a = boards[emptiest[i]];
      const b = boards[emptiest[j]];
      if (!a || !b) continue;
      const merged = [...a.items, ...b.items];
      const before = model.bins[a.bin].costUnits + model.bins[b.bin].costUnits;
      left[a.bin]++;
      left[b.bin]++;
      let pick = -1;
      model.bins.forEach((bin, k) => {
        if (
          left[k] > 0 &&
          bin.costUnits < before &&
          (pick < 0 || bin.costUnits < model.bins[pick].costUnits) &&
          boardFits(model, k, merged)
        )
          pick = k;
      });
      if (pick < 0) {
        left[a.bin]--;
        left[b.bin]--;
        continue;
      }
      left[pick]--;
      boards[emptiest[i]] = makeBoard(model, pick, merged);
      boards[emptiest[j]] = null;
    }
  }
  boards = boards.filter((b) => b !== null);
  return { boards: boards as PackedBoard[], unplaced: packing.unplaced };
}
