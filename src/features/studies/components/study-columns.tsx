import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import type { StudySummary } from '@shared/schemas/records-types';
import { studyStatusLabels } from '@shared/schemas/studies';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { StudyStatusBadge } from './study-status-badge';

const column = createColumnHelper<StudySummary>();

export const studyColumns = [
  column.accessor('name', {
    header: 'Study',
    cell: ({ row }) => (
      <Link to={paths.study.href(row.original.id)} className="font-semibold text-accent-700 hover:underline">
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor((s) => studyStatusLabels[s.status], {
    id: 'status',
    header: 'Status',
    cell: ({ row }) => <StudyStatusBadge status={row.original.status} />,
  }),
  column.accessor('enzymeName', { header: 'Enzyme' }),
  column.accessor('variantCount', { header: 'Variants', meta: { numeric: true } }),
  column.accessor('assayName', { header: 'Assay' }),
  column.accessor('ownerName', { header: 'Owner' }),
  column.accessor('teamName', { header: 'Team' }),
  column.accessor('updatedAt', {
    header: 'Updated',
    meta: { numeric: true, className: 'whitespace-nowrap' },
    cell: (c) => formatDate(c.getValue()),
  }),
];
