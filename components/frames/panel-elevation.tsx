import type { PanelLayout } from '@/lib/frames';
import { labelSizes, placeDrawingLabels } from '@/lib/frames/place-labels';

const MARGIN = 400; // mm around the drawing for dimension lines

/** Draws a panel layout to scale as SVG; y is flipped so the drawing's y runs up. Pure, no state. */
export function PanelElevation({ layout, className }: { layout: PanelLayout; className?: string }) {
  const { minX, minY, maxX, maxY } = layout.bounds;
  const flip = (y: number) => maxY - y;
  // Every mark and dimension placed clear of the others, so no two labels overlap.
  const labels = placeDrawingLabels(layout, labelSizes(layout.bounds));
  const boxes = [...labels.marks, ...labels.dimensions];
  const left = Math.min(minX - MARGIN, ...boxes.map((b) => b.x - b.width / 2));
  const right = Math.max(maxX + MARGIN, ...boxes.map((b) => b.x + b.width / 2));
  const top = Math.min(-MARGIN, ...boxes.map((b) => flip(b.y) - b.height / 2));
  const bottom = Math.max(maxY - minY + MARGIN, ...boxes.map((b) => flip(b.y) + b.height / 2));
  const viewBox = `${left} ${top} ${right - left} ${bottom - top}`;
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
      {layout.dimensions.map((d, k) => {
        const len = Math.hypot(d.to.x - d.from.x, d.to.y - d.from.y) || 1;
        // Shift square to the measured line, towards the left of from → to.
        const nx = -(d.to.y - d.from.y) / len;
        const ny = (d.to.x - d.from.x) / len;
        const [x1, y1] = [d.from.x + nx * d.offset, flip(d.from.y + ny * d.offset)];
        const [x2, y2] = [d.to.x + nx * d.offset, flip(d.to.y + ny * d.offset)];
        return <line key={`d${k}`} x1={x1} y1={y1} x2={x2} y2={y2} stroke="#1d4ed8" strokeWidth={4} />;
      })}
      {labels.dimensions.map((label, k) => (
        <text
          key={`dt${k}`}
          data-label="dimension"
          x={label.x}
          y={flip(label.y)}
          fontSize={label.size}
          textAnchor="middle"
          dominantBaseline="central"
          fill="#1d4ed8"
        >
          {label.text}
        </text>
      ))}
      {labels.marks.map((label) => (
        <text
          key={`m${label.shapeIndex}`}
          data-label="mark"
          x={label.x}
          y={flip(label.y)}
          fontSize={label.size}
          textAnchor="middle"
          dominantBaseline="central"
        >
          {label.text}
        </text>
      ))}
    </svg>
  );
}
