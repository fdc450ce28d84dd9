// One board for the PDF cut sheet, drawn with react-pdf's SVG: scrap hatched, kept remainder dotted.
import { Circle, G, Line, Rect, Svg, Text } from '@react-pdf/renderer';
import { layOutBoard, type BoardInput } from '@/lib/plans/board-layout';

const W = 500;
const H = 30;

function hatch(x0: number, x1: number, key: string) {
  const lines = [];
  for (let start = x0 - H; start < x1; start += 6) {
    const a = Math.max(x0, start);
    const b = Math.min(x1, start + H);
    if (b <= a) continue;
    lines.push(
      <Line
        key={`${key}-${start}`}
        x1={a}
        y1={H - (a - start)}
        x2={b}
        y2={H - (b - start)}
        stroke="#a3271f"
        strokeWidth={1.2}
      />,
    );
  }
  return lines;
}

function dots(x0: number, x1: number, key: string) {
  const out = [];
  for (let x = x0 + 4; x < x1 - 2; x += 8)
    for (const y of [8, 16, 24])
      out.push(<Circle key={`${key}-${x}-${y}`} cx={x} cy={y} r={1.4} fill="#b86a12" />);
  return out;
}

export function PdfBoard({ board, format }: { board: BoardInput; format: (mm: number) => string }) {
  const scale = W / board.lengthMm;
  return (
    <Svg width={W} height={H} viewBox={`0 0 ${W} ${H}`}>
      <Rect x={0} y={0} width={W} height={H} fill="#ffffff" stroke="#231a12" strokeWidth={1} />
      {layOutBoard(board).map((part, i) => {
        const x = part.startMm * scale;
        const w = part.lengthMm * scale;
        if (part.kind === 'kerf')
          return <Rect key={i} x={x} y={0} width={Math.max(w, 0.8)} height={H} fill="#231a12" />;
        if (part.kind === 'piece') {
          return (
            <G key={i}>
              <Rect
                x={x}
                y={0}
                width={w}
                height={H}
                fill={part.index % 2 ? '#b9d6ca' : '#d7e8e1'}
                stroke="#1d5545"
                strokeWidth={0.6}
              />
              {w > 28 && (
                <Text x={x + w / 2} y={H / 2 + 3} textAnchor="middle" style={{ fontSize: 8 }} fill="#231a12">
                  {format(part.lengthMm)}
                </Text>
              )}
            </G>
          );
        }
        return (
          <G key={i}>
            <Rect x={x} y={0} width={w} height={H} fill={part.kind === 'kept' ? '#fbe6c8' : '#f8dcd8'} />
            {part.kind === 'kept' ? dots(x, x + w, `d${i}`) : hatch(x, x + w, `h${i}`)}
          </G>
        );
      })}
    </Svg>
  );
}
