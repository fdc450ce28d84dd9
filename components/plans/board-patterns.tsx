// Fills shared by the diagrams and their legend. Scrap is hatched, a kept remainder dotted, so the
// two differ by pattern as well as colour (greyscale print, colour-blind readers).
export function BoardPatterns({ prefix }: { prefix: string }) {
  return (
    <defs>
      <pattern
        id={`${prefix}-scrap`}
        width="8"
        height="8"
        patternUnits="userSpaceOnUse"
        patternTransform="rotate(45)"
      >
        <rect width="8" height="8" fill="#f8dcd8" />
        <line x1="0" y1="0" x2="0" y2="8" stroke="#a3271f" strokeWidth="3" />
      </pattern>
      <pattern id={`${prefix}-kept`} width="10" height="10" patternUnits="userSpaceOnUse">
        <rect width="10" height="10" fill="#fbe6c8" />
        <circle cx="5" cy="5" r="2" fill="#b86a12" />
      </pattern>
    </defs>
  );
}

export const PIECE_FILLS = ['#d7e8e1', '#b9d6ca'];
export const INK = '#231a12';
