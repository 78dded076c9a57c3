import { flexRender, type Table } from '@tanstack/react-table';

/** The header rows of a TanStack table, with sort buttons and aria-sort on sortable columns. */
export function SortableTableHead<T>({ table }: { table: Table<T> }) {
  return (
    <thead className="border-b border-rule text-sm text-ink-soft">
      {table.getHeaderGroups().map((hg) => (
        <tr key={hg.id}>
          {hg.headers.map((h) => {
            const sorted = h.column.getIsSorted();
            return (
              <th key={h.id} scope="col" className="px-3 py-2 font-medium" aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}>
                {h.column.getCanSort() ? (
                  <button type="button" className="inline-flex items-center gap-1 rounded font-medium" onClick={h.column.getToggleSortingHandler()}>
                    {flexRender(h.column.columnDef.header, h.getContext())}
                    <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                  </button>
                ) : (
                  flexRender(h.column.columnDef.header, h.getContext())
                )}
              </th>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}
