import { createColumnHelper } from '@tanstack/react-table';
import { Link } from 'react-router';
import { formatPlain } from '@/components/ui/numbers';
import { paths } from '@/config/paths';
import type { AssayListItem } from '../api/get-assays';
import { detectionLabels, readModeLabels } from '../utils/assay-words';

const column = createColumnHelper<AssayListItem>();

export const assayColumns = [
  column.accessor('name', {
    header: 'Assay',
    cell: ({ row }) => (
      <Link to={paths.assay.href(row.original.id)} className="font-semibold text-accent-700 hover:underline">
        {row.original.name}
      </Link>
    ),
  }),
  column.accessor('substrate', { header: 'Substrate' }),
  column.accessor('substrateMm', {
    header: '[S] (mM)',
    meta: { numeric: true },
    cell: (c) => formatPlain(c.getValue()),
  }),
  column.accessor((a) => readModeLabels[a.readMode], { id: 'readMode', header: 'Read mode' }),
  column.accessor((a) => detectionLabels[a.detection], { id: 'detection', header: 'Detection' }),
  column.accessor('wavelengthNm', { header: 'λ (nm)', meta: { numeric: true } }),
  column.accessor('temperatureC', {
    header: 'T (°C)',
    meta: { numeric: true },
    cell: (c) => formatPlain(c.getValue()),
  }),
  column.accessor('teamName', { header: 'Team' }),
];
