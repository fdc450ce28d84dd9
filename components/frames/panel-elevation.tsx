import type { PanelLayout } from '@/lib/frames';

const MARGIN = 400; // mm around the drawing for dimension lines

/** Draws a panel layout to scale as SVG; y is flipped so the drawing's y runs up. Pure, no state. */
export function PanelElevation({ layout, className }: { layout: PanelLayout; className?: string }) {
  const { minX, minY, maxX, maxY } = layout.bounds;
  const flip = (y: number) => maxY - y;
  const viewBox = `${minX - MARGIN} ${-MARGIN} ${maxX - minX + 2 * MARGIN} ${maxY - minY + 2 * MARGIN}`;
  // Text grows with the drawing so marks stay readable when a large panel is drawn small.
  const extent = Math.max(maxX - minX, maxY - minY);
  const markSize = Math.max(60, extent / 32);
  const dimensionSize = Math.max(70, extent / 24);
  return (
    <svg viewBox={viewBox} className={className} role="img" aria-label={`${layout.title} (${layout.view})`}>
      {layout.shapes.map((shape, k) => (
        <polygon
          key={k}
          points={shape.points.map((p) => `${p.x},${flip(p.y)}`).join(' ')}
          fill={shape.role === 'opening' ? 'none' : '#e9d8b4'}
          stroke={shape.role === 'opening' ? '#888' : '#5b4636'}
          strokeDasharray={shape.role === 'opening' ? '40 30' : undefined}
          strokeWidth={6}
        >
          <title>{shape.mark ? `${shape.mark} ${shape.label}` : shape.label}</title>
        </polygon>
      ))}
      {layout.shapes.map((shape, k) => {
        if (!shape.mark) return null;
        const cx = shape.points.reduce((s, p) => s + p.x, 0) / shape.points.length;
        const cy = shape.points.reduce((s, p) => s + flip(p.y), 0) / shape.points.length;
        return (
          <text key={`m${k}`} x={cx} y={cy} fontSize={markSize} textAnchor="middle" dominantBaseline="middle">
            {shape.mark}
          </text>
        );
      })}
      {layout.dimensions.map((d, k) => {
        const len = Math.hypot(d.to.x - d.from.x, d.to.y - d.from.y) || 1;
        // Shift square to the measured line, towards the left of from → to.
        const nx = -(d.to.y - d.from.y) / len;
        const ny = (d.to.x - d.from.x) / len;
        const [x1, y1] = [d.from.x + nx * d.offset, flip(d.from.y + ny * d.offset)];
        const [x2, y2] = [d.to.x + nx * d.offset, flip(d.to.y + ny * d.offset)];
        return (
          <g key={`d${k}`} stroke="#1d4ed8" strokeWidth={4}>
            <line x1={x1} y1={y1} x2={x2} y2={y2} />
            <text
              x={(x1 + x2) / 2}
              y={(y1 + y2) / 2 - 20}
              fontSize={dimensionSize}
              textAnchor="middle"
              fill="#1d4ed8"
              stroke="none"
            >
              {d.text}
            </text>
          </g>
        );
      })}
    </svg>
  );
}
