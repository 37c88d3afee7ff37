// A pH value on its pH-scale colour.
import { inkOnPh, phColor } from '@/components/ui/ph-scale';

export type PhChipProps = { pH: number };

export function PhChip({ pH }: PhChipProps) {
  return (
    <span
      className="inline-block min-w-11 rounded px-1.5 text-right font-semibold tabular-nums"
      style={{ background: phColor(pH), color: inkOnPh(pH) }}
    >
      {pH.toFixed(2)}
    </span>
  );
}
