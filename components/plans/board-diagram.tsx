'use client';

import { useId } from 'react';
import { BoardPatterns, INK, PIECE_FILLS } from './board-patterns';
import { layOutBoard, type BoardInput } from '@/lib/plans/board-layout';

const WIDTH = 1000;
const HEIGHT = 64;
const MIN_KERF_WIDTH = 2;

/** One board drawn to scale: trim, pieces with length and label, kerfs, and the kept or scrapped end. */
export function BoardDiagram({
  board,
  format,
  title,
}: {
  board: BoardInput;
  format: (mm: number) => string;
  title: string;
}) {
  const prefix = useId().replace(/:/g, '');
  const scale = WIDTH / board.lengthMm;
  const x = (mm: number) => mm * scale;
  const parts = layOutBoard(board);
  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      className="h-auto w-full"
      role="img"
      aria-label={title}
      data-testid="board-diagram"
    >
      <title>{title}</title>
      <BoardPatterns prefix={prefix} />
      <rect x={0} y={0} width={WIDTH} height={HEIGHT} fill="white" stroke={INK} strokeWidth={1.5} />
      {parts.map((part, i) => {
        const width = x(part.lengthMm);
        if (part.kind === 'kerf') {
          return (
            <rect
              key={i}
              x={x(part.startMm)}
              y={0}
              width={Math.max(width, MIN_KERF_WIDTH)}
              height={HEIGHT}
              fill={INK}
            >
              {/* One string child: React renders a <title> with several children empty on the server. */}
              <title>{`kerf ${format(part.lengthMm)}`}</title>
            </rect>
          );
        }
        if (part.kind === 'piece') {
          const cx = x(part.startMm) + width / 2;
          const roomy = width > 70;
          return (
            <g key={i}>
              <rect
                x={x(part.startMm)}
                y={0}
                width={width}
                height={HEIGHT}
                fill={PIECE_FILLS[part.index % 2]}
                stroke="#1d5545"
                strokeWidth={1}
              >
                <title>
                  {part.listedMm !== part.lengthMm
                    ? `${part.label || 'piece'} ${format(part.lengthMm)}, listed ${format(part.listedMm)}`
                    : `${part.label || 'piece'} ${format(part.lengthMm)}`}
                </title>
              </rect>
              {width > 30 && (
                <text
                  x={cx}
                  y={roomy ? 28 : 38}
                  textAnchor="middle"
                  fontSize={roomy ? 17 : 13}
                  fontWeight={700}
                  fill={INK}
                >
                  {format(part.lengthMm)}
                </text>
              )}
              {roomy && part.label && (
                <text x={cx} y={50} textAnchor="middle" fontSize={13} fill={INK}>
                  {part.label.length * 7 > width
                    ? `${part.label.slice(0, Math.max(3, Math.floor(width / 7) - 1))}…`
                    : part.label}
                </text>
              )}
            </g>
          );
        }
        const fill = `url(#${prefix}-${part.kind === 'kept' ? 'kept' : 'scrap'})`;
        const name = part.kind === 'kept' ? 'kept' : part.kind === 'trim' ? 'trim' : 'scrap';
        return (
          <g key={i}>
            <rect
              x={x(part.startMm)}
              y={0}
              width={width}
              height={HEIGHT}
              fill={fill}
              stroke={INK}
              strokeWidth={0.5}
            >
              <title>{`${name} ${format(part.lengthMm)}`}</title>
            </rect>
            {part.kind !== 'trim' && width > 60 && (
              <g>
                <rect
                  x={x(part.startMm) + width / 2 - 42}
                  y={20}
                  width={84}
                  height={24}
                  rx={4}
                  fill="white"
                  opacity={0.9}
                />
                <text
                  x={x(part.startMm) + width / 2}
                  y={37}
                  textAnchor="middle"
                  fontSize={13}
                  fontWeight={700}
                  fill={INK}
                >
                  {name} {format(part.lengthMm)}
                </text>
              </g>
            )}
          </g>
        );
      })}
    </svg>
  );
}
