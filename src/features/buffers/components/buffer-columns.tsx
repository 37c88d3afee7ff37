// Columns of the buffer library. A system has one to three ionizations: their values stack in a cell,
// one line per step; sorting uses the first step.
import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { BufferStepSummary, BufferSummary } from '@shared/schemas/buffers-types';
import { Badge } from '@/components/ui/badge';
import { formatFixed, formatSigned } from '@/components/ui/numbers';
import { paths } from '@/config/paths';

const column = createColumnHelper<BufferSummary>();

function Steps({ steps, show }: { steps: BufferStepSummary[]; show: (s: BufferStepSummary) => ReactNode }) {
  return (
    <span className="flex flex-col">
      {steps.map((s) => (
        <span key={s.label}>{show(s)}</span>
      ))}
    </span>
  );
}

const charge = (z: number) => (z > 0 ? `+${z}` : z < 0 ? `−${-z}` : '0');

export const bufferColumns = [
  // Name and aliases together, so the search box finds "THAM" as well as "Tris".
  column.accessor((b) => [b.name, ...b.aliases].join(' '), {
    id: 'name',
    header: 'Buffer system',
    cell: ({ row }) => (
      <span>
        <Link
          to={paths.buffer.href(row.original.id)}
          className="font-semibold text-accent-700 hover:underline"
        >
          {row.original.name}
        </Link>
        {row.original.aliases.length > 0 && (
          <span className="block text-sm text-ink-muted">{row.original.aliases.join(', ')}</span>
        )}
      </span>
    ),
  }),
  column.accessor((b) => b.steps.map((s) => s.label).join(' '), {
    id: 'steps',
    header: 'Step',
    enableSorting: false,
    cell: ({ row }) => <Steps steps={row.original.steps} show={(s) => s.label} />,
  }),
  column.accessor((b) => b.steps[0].pKa25, {
    id: 'pKa25',
    header: 'pKa 25 °C',
    meta: { numeric: true },
    cell: ({ row }) => <Steps steps={row.original.steps} show={(s) => formatFixed(s.pKa25, 3)} />,
  }),
  column.accessor((b) => b.steps[0].pKa37 ?? undefined, {
    id: 'pKa37',
    header: 'pKa 37 °C',
    meta: { numeric: true },
    sortUndefined: 'last',
    cell: ({ row }) => <Steps steps={row.original.steps} show={(s) => formatFixed(s.pKa37, 2)} />,
  }),
  column.accessor((b) => b.steps[0].dpKadT ?? undefined, {
    id: 'dpKadT',
    header: 'dpKa/dT (K⁻¹)',
    meta: { numeric: true },
    sortUndefined: 'last',
    cell: ({ row }) => <Steps steps={row.original.steps} show={(s) => formatSigned(s.dpKadT, 4)} />,
  }),
  column.accessor((b) => b.steps[0].zAcid, {
    id: 'zAcid',
    header: 'z (acid form)',
    meta: { numeric: true },
    cell: ({ row }) => <Steps steps={row.original.steps} show={(s) => charge(s.zAcid)} />,
  }),
  column.accessor((b) => (b.builtIn ? 'Built-in' : 'Lab'), {
    id: 'origin',
    header: 'Origin',
    cell: ({ row }) => (row.original.builtIn ? <Badge>Built-in</Badge> : <Badge tone="accent">Lab</Badge>),
  }),
  column.accessor((b) => (b.designerDefault ? 'Yes' : 'On request'), {
    id: 'designer',
    header: 'Designer offers it',
  }),
];
