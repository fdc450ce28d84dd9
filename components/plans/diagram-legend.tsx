import { BoardPatterns, INK, PIECE_FILLS } from './board-patterns';

const swatch = (fill: string, label: string) => (
  <li className="flex items-center gap-2">
    <svg width="36" height="20" aria-hidden="true">
      <BoardPatterns prefix="legend" />
      <rect width="36" height="20" fill={fill} stroke={INK} strokeWidth={1} />
    </svg>
    {label}
  </li>
);

/** What the diagram fills mean. */
export function DiagramLegend() {
  return (
    <ul
      className="flex flex-wrap gap-x-6 gap-y-2 text-sm"
      aria-label="Diagram legend"
      data-testid="diagram-legend"
    >
      {swatch(PIECE_FILLS[0], 'Piece (length and label)')}
      {swatch(INK, 'Saw kerf')}
      {swatch('url(#legend-kept)', 'Kept remainder: back on the rack (dots)')}
      {swatch('url(#legend-scrap)', 'Scrap or end trim (hatched)')}
    </ul>
  );
}
