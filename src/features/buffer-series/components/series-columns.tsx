import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { SeriesSummary } from '@shared/schemas/buffer-series';
import { formatFixed, formatSig } from '@/components/ui/numbers';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';

const column = createColumnHelper<SeriesSummary & { teamName: string }>();

const range = (s: SeriesSummary) => {
  const p = s.input.pHPoints;
  return p.length ? `${formatFixed(Math.min(...p), 2)} – ${formatFixed(Math.max(...p), 2)}` : '—';
};

export const seriesColumns = [
  column.accessor('name', {
    header: 'Series',
    cell: ({ row }) => (
      <Link
        to={paths.bufferSeries.href(row.original.id)}
        className="font-semibold text-accent-700 hover:underline"
      >
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor((s) => Math.min(...s.input.pHPoints), {
    id: 'range',
    header: 'pH range',
    meta: { numeric: true },
    cell: ({ row }) => range(row.original),
  }),
  column.accessor((s) => s.input.pHPoints.length, {
    id: 'points',
    header: 'Points',
    meta: { numeric: true },
  }),
  column.accessor((s) => s.input.assayTemperatureC, {
    id: 'temperature',
    header: 'Assay T (°C)',
    meta: { numeric: true },
    cell: (c) => formatSig(c.getValue(), 3),
  }),
  column.accessor((s) => s.input.bufferConcMm, {
    id: 'conc',
    header: 'Buffer (mM)',
    meta: { numeric: true },
    cell: (c) => formatSig(c.getValue(), 3),
  }),
  column.accessor('teamName', { header: 'Team' }),
  column.accessor('createdBy', { header: 'Made by' }),
  column.accessor('updatedAt', {
    header: 'Updated',
    meta: { numeric: true, className: 'whitespace-nowrap' },
    cell: (c) => formatDate(c.getValue()),
  }),
];
