// The series' cautions (buffer-specific, temperature, ionic strength, safety) and warnings.
import type { DesignedSeries } from '@shared/schemas/buffer-series';
import { Notice } from '@/components/ui/notice';

export type SeriesCautionsProps = { design: DesignedSeries };

export function SeriesCautions({ design }: SeriesCautionsProps) {
  const items = [...design.warnings, ...design.cautions];
  if (items.length === 0) return null;
  return (
    <Notice tone="warning" title="Cautions">
      <ul className="list-disc space-y-0.5 pl-4">
        {items.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </Notice>
  );
}
