// A short sample of a profile's line (its colour and dash), beside its name in tables.
import type { ProfileStyle } from '../utils/colors';

export function LineSwatch({ style }: { style?: ProfileStyle }) {
  return (
    <svg viewBox="0 0 14 8" className="h-2 w-3.5 shrink-0" aria-hidden="true">
      <line
        x1="0"
        x2="14"
        y1="4"
        y2="4"
        stroke={style?.color ?? '#000'}
        strokeWidth="3"
        strokeDasharray={style?.dash}
      />
    </svg>
  );
}
