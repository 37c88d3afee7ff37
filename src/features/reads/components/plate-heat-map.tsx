// A plate as a heat map of one number per well on the signal scale (pale = low, dark = high).
// Wells without a value are white with a mark for why: saturated (▲), empty (–), invalid (×).
// One SVG of plain rectangles, so a 384-well preview stays light.
import { plateDimensions, type PlateFormat } from '@shared/plate/geometry';
import { SignalLegend } from '@/components/ui/signal-legend';
import { inkOnSignal, signalColor, signalDomain } from '@/components/ui/signal-scale';

export type PlateHeatMapProps = {
  format: PlateFormat;
  values: Record<string, number | null>;
  flags?: Record<string, string>;
  /** Size of one well in px. */
  cell?: number;
  label: string;
  legendTitle?: string;
  selectedWell?: string | null;
  onSelectWell?: (well: string) => void;
  showValues?: boolean;
};

const ROWS = 'ABCDEFGHIJKLMNOP';
export const flagMarks: Record<string, string> = { saturated: '▲', empty: '–', invalid: '×' };

export function PlateHeatMap({
  format,
  values,
  flags = {},
  cell = 14,
  label,
  legendTitle = 'Signal',
  selectedWell,
  onSelectWell,
  showValues,
}: PlateHeatMapProps) {
  const { rows, columns } = plateDimensions(format);
  const left = cell >= 20 ? 18 : 12;
  const top = cell >= 20 ? 14 : 10;
  const [lo, hi] = signalDomain(Object.values(values));
  const width = left + columns * cell;
  const height = top + rows * cell;
  const font = Math.max(7, Math.min(11, cell * 0.45));
  const labelEvery = cell < 12 ? 2 : 1;
  const items = [];
  for (let r = 0; r < rows; r++) {
    for (let c = 0; c < columns; c++) {
      const well = `${ROWS[r]}${c + 1}`;
      const v = values[well];
      const x = left + c * cell;
      const y = top + r * cell;
      const has = typeof v === 'number';
      const t = has ? (v - lo) / (hi - lo) : 0;
      items.push(
        <g key={well} transform={`translate(${x},${y})`} data-well={well}>
          <rect
            width={cell - 1}
            height={cell - 1}
            fill={has ? signalColor(t) : '#ffffff'}
            stroke={has ? 'none' : '#d8ddda'}
          />
          {!has && well in values && (
            <text
              x={(cell - 1) / 2}
              y={(cell - 1) / 2 + font * 0.35}
              fontSize={font}
              textAnchor="middle"
              fill="#b3261e"
            >
              {flagMarks[flags[well] ?? ''] ?? '·'}
            </text>
          )}
          {has && showValues && cell >= 34 && (
            <text
              x={(cell - 1) / 2}
              y={(cell - 1) / 2 + 3}
              fontSize={8.5}
              textAnchor="middle"
              fill={inkOnSignal(t)}
            >
              {v.toPrecision(3)}
            </text>
          )}
          {selectedWell === well && (
            <rect x={-0.5} y={-0.5} width={cell} height={cell} fill="none" stroke="#0b4845" strokeWidth={2} />
          )}
        </g>,
      );
    }
  }
  return (
    <div>
      <svg
        role="img"
        aria-label={label}
        width={width}
        height={height}
        viewBox={`0 0 ${width} ${height}`}
        className={onSelectWell ? 'cursor-pointer' : undefined}
        onClick={(e) => {
          if (!onSelectWell) return;
          const box = e.currentTarget.getBoundingClientRect();
          const c = Math.floor(((e.clientX - box.left) * (width / box.width) - left) / cell);
          const r = Math.floor(((e.clientY - box.top) * (height / box.height) - top) / cell);
          if (r >= 0 && r < rows && c >= 0 && c < columns) onSelectWell(`${ROWS[r]}${c + 1}`);
        }}
      >
        {Array.from({ length: columns }, (_, c) =>
          c % labelEvery === 0 ? (
            <text
              key={`c${c}`}
              x={left + c * cell + cell / 2}
              y={top - 3}
              fontSize={Math.min(10, font)}
              textAnchor="middle"
              fill="#4f5a5c"
            >
              {c + 1}
            </text>
          ) : null,
        )}
        {Array.from({ length: rows }, (_, r) =>
          r % labelEvery === 0 ? (
            <text
              key={`r${r}`}
              x={left - 3}
              y={top + r * cell + cell / 2 + 3}
              fontSize={Math.min(10, font)}
              textAnchor="end"
              fill="#4f5a5c"
            >
              {ROWS[r]}
            </text>
          ) : null,
        )}
        {items}
      </svg>
      <SignalLegend min={lo} max={hi} title={legendTitle} width={Math.min(160, width - 100)} />
    </div>
  );
}
