// The one table of the app: TanStack Table with sorting, a search box, optional column filters,
// an empty state and optional row selection. Every list screen uses it.
import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type ColumnFiltersState,
  type RowData,
  type SortingState,
} from '@tanstack/react-table';
import { useState, type ReactNode } from 'react';
import { DataTableToolbar, type ColumnFilter } from './data-table-toolbar';
import { SortMark } from './sort-mark';

declare module '@tanstack/react-table' {
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Right-aligned, tabular figures. */
    numeric?: boolean;
    className?: string;
    /** Phantom use of the type parameters (the interface must declare them). */
    _types?: [TData, TValue];
  }
}

export type { ColumnDef, ColumnFilter };

export type DataTableProps<T> = {
  data: T[];
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- columns of mixed value types
  columns: ColumnDef<T, any>[];
  /** Names the table for assistive technology. */
  label: string;
  search?: { label: string; placeholder?: string } | false;
  filters?: ColumnFilter[];
  initialSorting?: SortingState;
  enableSorting?: boolean;
  empty: ReactNode;
  getRowId?: (row: T) => string;
  onRowClick?: (row: T) => void;
  selectedRowId?: string | null;
  toolbar?: ReactNode;
};

export function DataTable<T>(props: DataTableProps<T>) {
  const {
    data,
    columns,
    label,
    search = false,
    filters = [],
    enableSorting = true,
    empty,
    onRowClick,
  } = props;
  const [sorting, setSorting] = useState<SortingState>(props.initialSorting ?? []);
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter, columnFilters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    enableSorting,
    // Column filters pick one exact value (a role, a state); the search box matches any part.
    defaultColumn: { filterFn: 'equalsString' },
    getRowId: props.getRowId,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const rows = table.getRowModel().rows;
  const filtered = globalFilter !== '' || columnFilters.length > 0;

  return (
    <div>
      {(search || filters.length > 0 || props.toolbar) && (
        <DataTableToolbar
          table={table}
          search={search || undefined}
          filters={filters}
          extra={props.toolbar}
        />
      )}
      <div className="overflow-x-auto rounded border border-line bg-surface">
        <table aria-label={label} className="w-full border-collapse">
          <thead className="bg-canvas text-left text-sm text-ink-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const meta = header.column.columnDef.meta;
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined
                      }
                      className={`border-b border-line px-3 py-1.5 font-semibold ${meta?.numeric ? 'text-right' : ''} ${meta?.className ?? ''}`}
                    >
                      {header.isPlaceholder ? null : header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 hover:text-ink"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <SortMark direction={sorted} />
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {rows.length === 0 && (
              <tr>
                <td
                  colSpan={table.getAllLeafColumns().length}
                  className="px-3 py-6 text-center text-ink-muted"
                >
                  {filtered && data.length > 0 ? 'Nothing matches the search or filters.' : empty}
                </td>
              </tr>
            )}
            {rows.map((row) => {
              const selected = props.selectedRowId != null && row.id === props.selectedRowId;
              return (
                <tr
                  key={row.id}
                  onClick={onRowClick ? () => onRowClick(row.original) : undefined}
                  onKeyDown={
                    onRowClick
                      ? (e) =>
                          (e.key === 'Enter' || e.key === ' ') &&
                          (e.preventDefault(), onRowClick(row.original))
                      : undefined
                  }
                  tabIndex={onRowClick ? 0 : undefined}
                  aria-selected={onRowClick ? selected : undefined}
                  className={`border-b border-line last:border-b-0 ${onRowClick ? 'cursor-pointer hover:bg-accent-50' : ''} ${selected ? 'bg-accent-50' : ''}`}
                >
                  {row.getVisibleCells().map((cell) => {
                    const meta = cell.column.columnDef.meta;
                    return (
                      <td
                        key={cell.id}
                        className={`px-3 py-1.5 align-top ${meta?.numeric ? 'num' : ''} ${meta?.className ?? ''}`}
                      >
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
