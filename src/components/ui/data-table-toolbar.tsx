import type { Table } from '@tanstack/react-table';
import { useId, type ReactNode } from 'react';

export type ColumnFilter = {
  columnId: string;
  label: string;
  /** The first option is "any"; values are compared with the column's value as text. */
  options: { value: string; label: string }[];
};

export type DataTableToolbarProps<T> = {
  table: Table<T>;
  search?: { label: string; placeholder?: string };
  filters: ColumnFilter[];
  extra?: ReactNode;
};

const control = 'h-8 rounded border border-line-strong bg-surface px-2 text-ink';

export function DataTableToolbar<T>({ table, search, filters, extra }: DataTableToolbarProps<T>) {
  const searchId = useId();
  return (
    <div className="mb-2 flex flex-wrap items-end gap-3">
      {search && (
        <div>
          <label htmlFor={searchId} className="mb-0.5 block text-sm text-ink-muted">
            {search.label}
          </label>
          <input
            id={searchId}
            type="search"
            value={(table.getState().globalFilter as string) ?? ''}
            onChange={(e) => table.setGlobalFilter(e.target.value)}
            placeholder={search.placeholder}
            className={`${control} w-64`}
          />
        </div>
      )}
      {filters.map((filter) => (
        <FilterSelect key={filter.columnId} table={table} filter={filter} />
      ))}
      {extra && <div className="ml-auto flex items-center gap-2">{extra}</div>}
    </div>
  );
}

function FilterSelect<T>({ table, filter }: { table: Table<T>; filter: ColumnFilter }) {
  const id = useId();
  const column = table.getColumn(filter.columnId);
  if (!column) return null;
  return (
    <div>
      <label htmlFor={id} className="mb-0.5 block text-sm text-ink-muted">
        {filter.label}
      </label>
      <select
        id={id}
        value={(column.getFilterValue() as string | undefined) ?? ''}
        onChange={(e) => column.setFilterValue(e.target.value || undefined)}
        className={control}
      >
        <option value="">Any</option>
        {filter.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </div>
  );
}
