import { LocalDate } from '~/components/LocalDate';
import { issueText } from '~/lib/design/labels';
import { useCallback, useMemo, useRef, useState, type FormEvent } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from '@tanstack/react-table';
import { FormMessage } from '~/components/ui/FormMessage';
import { SortableTableHead } from '~/components/ui/SortableTableHead';
import { formatSi, formatTurns } from '~/lib/format';
import { checkDesignName } from '~/lib/design/name';
import { Dialog } from './Dialog';
import { ApiFailure, failureMessage } from '~/lib/api/client';
import { withApi } from '~/lib/api/provider';
import { useDeleteDesign, useDesignList, useDuplicateDesign, useImportDesign, useRenameDesign, type LibraryRow } from '~/lib/api/queries/designs';
import type { DesignRole } from '~/lib/permissions';

type Props = { pageSize?: number };

const roleLabel: Record<DesignRole, string> = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer', admin: 'Site admin' };
const column = createColumnHelper<LibraryRow>();
const NO_GROUP = '__none';


function LibraryTable({ pageSize = 20 }: Props) {
  const list = useDesignList();
  const rows = useMemo(() => list.data ?? [], [list.data]);
  const loading = list.isPending;
  const [actionError, setActionError] = useState<string | null>(null);
  const error = actionError ?? (list.error ? failureMessage(list.error) : null);
  const [status, setStatus] = useState<string | null>(null);
  const rename = useRenameDesign();
  const duplicate = useDuplicateDesign();
  const remove = useDeleteDesign();
  const importFile = useImportDesign();
  const busy = rename.isPending || duplicate.isPending || remove.isPending || importFile.isPending;
  const setError = setActionError;
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updatedAt', desc: true }]);
  const [globalFilter, setGlobalFilter] = useState('');
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [renaming, setRenaming] = useState<LibraryRow | null>(null);
  const [newName, setNewName] = useState('');
  const [nameError, setNameError] = useState<string | null>(null);
  const [deleting, setDeleting] = useState<LibraryRow | null>(null);
  const fileRef = useRef<HTMLInputElement>(null);

  /** Runs one change; success or failure, the list is read again so it shows what is stored. */
  const run = useCallback(async (action: () => Promise<unknown>, done: string, failure?: (e: ApiFailure) => string) => {
    setActionError(null);
    setStatus(null);
    try {
      await action();
      setStatus(done);
      return true;
    } catch (e) {
      setActionError(e instanceof ApiFailure && failure ? failure(e) : failureMessage(e));
      return false;
    }
  }, []);
  const { mutateAsync: duplicateDesign } = duplicate;

  async function onRename(e: FormEvent) {
    e.preventDefault();
    if (!renaming) return;
    const name = newName.trim();
    const nameError = checkDesignName(name);
    if (nameError) return setNameError(nameError);
    const target = renaming;
    setRenaming(null);
    await run(() => rename.mutateAsync({ id: target.id, name }), `Renamed to “${name}”.`, (f) => f.issues[0]?.message ?? f.message);
  }

  async function onImport(file: File | undefined) {
    if (!file) return;
    if (file.size > 256 * 1024) return setError('That file is larger than 256 kB; a design file is only a few kB.');
    let parsed: unknown;
    try {
      parsed = JSON.parse(await file.text());
    } catch {
      return setError(`${file.name} is not a JSON file.`);
    }
    await run(
      () => importFile.mutateAsync(parsed),
      `Imported ${file.name}.`,
      (f) => {
        const detail = f.issues.slice(0, 5).map((i) => issueText({ path: i.path || 'file', message: i.message })).join('; ');
        return detail ? `${f.message} ${detail}` : f.message;
      },
    );
    if (fileRef.current) fileRef.current.value = '';
  }

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (c) => (
          <a href={`/designs/${c.row.original.id}`} className="font-medium">
            {c.getValue()}
          </a>
        ),
      }),
      column.accessor('loadedFrequency', {
        header: 'Loaded frequency',
        sortUndefined: 'last',
        cell: (c) => <span className="tabular-nums">{formatSi(c.getValue(), 'Hz', 3)}</span>,
      }),
      column.accessor((d) => d.calibratedTapTurns ?? d.tapTurns, {
        id: 'tapTurns',
        header: 'Tap',
        cell: (c) => {
          const d = c.row.original;
          const calibrated = d.calibratedTapTurns ?? null;
          return calibrated === null ? (
            <span className="tabular-nums" data-tap="predicted">{formatTurns(d.tapTurns)}</span>
          ) : (
            <span className="tabular-nums">
              <span data-tap="calibrated">{formatTurns(calibrated)}</span> <span className="text-xs text-ink-soft">measured; predicted {formatTurns(d.tapTurns)}</span>
            </span>
          );
        },
      }),
      column.accessor('updatedAt', { header: 'Updated', sortingFn: 'datetime', cell: (c) => <LocalDate iso={c.getValue()} withTime /> }),
      column.accessor('groupId', {
        header: 'Group',
        // '' is any; NO_GROUP keeps the designs that belong to no group
        filterFn: (row, _id, value: string) => (value === NO_GROUP ? !row.original.groupId : row.original.groupId === value),
        sortingFn: (a, b) => (a.original.groupName ?? '').localeCompare(b.original.groupName ?? ''),
        cell: (c) => c.row.original.groupName ?? <span className="text-ink-soft">—</span>,
      }),
      column.accessor('role', {
        header: 'My role',
        filterFn: 'equals',
        cell: (c) => roleLabel[c.getValue()],
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const d = c.row.original;
          const canWrite = d.role === 'owner' || d.role === 'editor';
          return (
            <div className="flex flex-wrap justify-end gap-1">
              {canWrite && (
                <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => { setRenaming(d); setNewName(d.name); setNameError(null); }}>
                  Rename<span className="sr-only"> {d.name}</span>
                </button>
              )}
              <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={busy} onClick={() => void run(() => duplicateDesign(d.id), `Copied “${d.name}” into a new design of yours.`)}>
                Duplicate<span className="sr-only"> {d.name}</span>
              </button>
              <a className="cw-btn cw-btn-quiet cw-btn-small" href={`/designs/${d.id}/history`}>
                History<span className="sr-only"> of {d.name}</span>
              </a>
              <a className="cw-btn cw-btn-quiet cw-btn-small" href={`/designs/${d.id}/people`}>
                People<span className="sr-only"> of {d.name}</span>
              </a>
              <a className="cw-btn cw-btn-quiet cw-btn-small" href={`/api/v1/designs/${d.id}/export`} download>
                Export<span className="sr-only"> {d.name}</span>
              </a>
              {d.role === 'owner' && (
                <button type="button" className="cw-btn cw-btn-quiet cw-btn-small text-fault" disabled={busy} onClick={() => setDeleting(d)}>
                  Delete<span className="sr-only"> {d.name}</span>
                </button>
              )}
            </div>
          );
        },
      }),
    ],
    [busy, duplicateDesign, run],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, globalFilter, columnFilters },
    onSortingChange: setSorting,
    onGlobalFilterChange: setGlobalFilter,
    onColumnFiltersChange: setColumnFilters,
    globalFilterFn: (row, _id, value: string) => row.original.name.toLowerCase().includes(String(value).trim().toLowerCase()),
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    initialState: { pagination: { pageIndex: 0, pageSize } },
    autoResetPageIndex: true,
  });

  const roleFilter = (table.getColumn('role')?.getFilterValue() as string | undefined) ?? '';
  const groupFilter = (table.getColumn('groupId')?.getFilterValue() as string | undefined) ?? '';
  const groupOptions = [...new Map(rows.filter((r) => r.groupId).map((r) => [r.groupId!, r.groupName ?? 'Unnamed group'])).entries()].sort((a, b) => a[1].localeCompare(b[1]));
  const shown = table.getFilteredRowModel().rows.length;
  const { pageIndex } = table.getState().pagination;
  const from = shown === 0 ? 0 : pageIndex * pageSize + 1;
  const to = Math.min((pageIndex + 1) * pageSize, shown);

  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <div className="min-w-48 flex-1">
          <label htmlFor="library-search" className="cw-label">
            Search by name
          </label>
          <input id="library-search" type="search" className="cw-input" value={globalFilter} onChange={(e) => setGlobalFilter(e.target.value)} autoComplete="off" />
        </div>
        <div>
          <label htmlFor="library-role" className="cw-label">
            My role
          </label>
          <select id="library-role" className="cw-input" value={roleFilter} onChange={(e) => table.getColumn('role')?.setFilterValue(e.target.value || undefined)}>
            <option value="">Any</option>
            <option value="owner">Owner</option>
            <option value="editor">Editor</option>
            <option value="viewer">Viewer</option>
          </select>
        </div>
        <div>
          <label htmlFor="library-group" className="cw-label">
            Group
          </label>
          <select id="library-group" className="cw-input" value={groupFilter} onChange={(e) => table.getColumn('groupId')?.setFilterValue(e.target.value || undefined)}>
            <option value="">Any</option>
            {groupOptions.map(([id, name]) => (
              <option key={id} value={id}>{name}</option>
            ))}
            <option value={NO_GROUP}>No group</option>
          </select>
        </div>
        <div className="flex gap-2">
          <a href="/designs/new" className="cw-btn cw-btn-primary">
            New design
          </a>
          <button type="button" className="cw-btn cw-btn-quiet" disabled={busy} onClick={() => fileRef.current?.click()}>
            Import a file
          </button>
          <input ref={fileRef} type="file" accept=".json,application/json" className="sr-only" tabIndex={-1} aria-label="Design file to import" onChange={(e) => void onImport(e.target.files?.[0])} />
        </div>
      </div>

      <FormMessage error={error} success={status} />

      <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
        <table className="w-full min-w-[52rem] border-collapse text-left" data-testid="library-table">
          <caption className="sr-only">My designs and designs shared with me</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-rule last:border-b-0" data-design-id={r.original.id}>
                {r.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-middle">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {!loading && shown === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">
                  {rows.length === 0 ? (
                    <>
                      No designs yet. <a href="/designs/new">Start a new design</a> or import a design file.
                    </>
                  ) : (
                    'No design matches the search and role filter.'
                  )}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>

      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <p aria-live="polite">{loading ? 'Loading…' : `${from}–${to} of ${shown}`}</p>
        <div className="flex gap-2">
          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={!table.getCanPreviousPage()} onClick={() => table.previousPage()}>
            Previous
          </button>
          <button type="button" className="cw-btn cw-btn-quiet cw-btn-small" disabled={!table.getCanNextPage()} onClick={() => table.nextPage()}>
            Next
          </button>
        </div>
      </div>

      <Dialog open={renaming !== null} title="Rename design" onClose={() => setRenaming(null)}>
        <form onSubmit={(e) => void onRename(e)} className="space-y-4" noValidate>
          <div>
            <label htmlFor="rename-input" className="cw-label">
              New name
            </label>
            <input
              id="rename-input"
              className="cw-input"
              value={newName}
              maxLength={200}
              onChange={(e) => setNewName(e.target.value)}
              aria-invalid={nameError ? true : undefined}
              aria-describedby={nameError ? 'rename-error' : undefined}
              autoFocus
            />
            {nameError && (
              <p id="rename-error" className="cw-field-error">
                {nameError}
              </p>
            )}
            <p className="cw-hint">Renaming saves a new revision.</p>
          </div>
          <div className="flex justify-end gap-2">
            <button type="button" className="cw-btn cw-btn-quiet" onClick={() => setRenaming(null)}>
              Cancel
            </button>
            <button type="submit" className="cw-btn cw-btn-primary">
              Rename
            </button>
          </div>
        </form>
      </Dialog>

      <Dialog open={deleting !== null} title="Delete this design?" onClose={() => setDeleting(null)}>
        <p>
          “{deleting?.name}” will be deleted for everyone who works on it, with all its revisions, share links, measurements and files. This cannot be undone.
        </p>
        <p className="mt-2 text-sm text-ink-soft">To keep a copy, export it first.</p>
        <div className="mt-4 flex justify-end gap-2">
          <button type="button" className="cw-btn cw-btn-quiet" onClick={() => setDeleting(null)} autoFocus>
            Keep it
          </button>
          <button
            type="button"
            className="cw-btn cw-btn-primary bg-fault"
            onClick={() => {
              const d = deleting;
              setDeleting(null);
              if (d) void run(() => remove.mutateAsync(d.id), `Deleted “${d.name}”.`);
            }}
          >
            Delete for good
          </button>
        </div>
      </Dialog>
    </div>
  );
}

/** The library: every design the person can open, sortable and filterable, with rename, copy, delete and import. */
export default withApi(LibraryTable);
