// Published: Wikipedia, "Cutting stock problem", example section: rolls of width 5600 cut to these
// widths (width, count). Optimum 73 rolls, LP value 72.917.
export const PAPER_ROLL_WIDTH = 5600;
export const paperRolls: [number, number][] = [
  [1380, 22],
  [1520, 25],
  [1560, 12],
  [1710, 14],
  [1820, 18],
  [1880, 18],
  [1930, 20],
  [2000, 10],
  [2050, 12],
  [2100, 14],
  [2140, 16],
  [2150, 18],
  [2200, 20],
];
