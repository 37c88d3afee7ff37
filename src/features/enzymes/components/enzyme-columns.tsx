import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { EnzymeSummary } from '@shared/schemas/records-types';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';

const column = createColumnHelper<EnzymeSummary>();

export const enzymeColumns = [
  column.accessor('name', {
    header: 'Enzyme',
    cell: ({ row }) => (
      <Link to={paths.enzyme.href(row.original.id)} className="font-semibold text-accent-700 hover:underline">
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor('organism', { header: 'Source organism', cell: (c) => c.getValue() || '—' }),
  column.accessor('teamName', { header: 'Team' }),
  column.accessor('variantCount', { header: 'Variants', meta: { numeric: true } }),
  column.accessor('updatedAt', {
    header: 'Updated',
    meta: { numeric: true, className: 'whitespace-nowrap' },
    cell: (c) => formatDate(c.getValue()),
  }),
];
