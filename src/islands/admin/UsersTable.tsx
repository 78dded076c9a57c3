import { LocalDate } from '~/components/LocalDate';
import { useCallback, useMemo, useState, type SubmitEvent } from 'react';
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from '@tanstack/react-table';
import { authErrorMessage, errorMessages } from '~/lib/errors';
import { FormMessage } from '~/components/ui/FormMessage';
import { SortableTableHead } from '~/components/ui/SortableTableHead';
import { withApi } from '~/lib/api/provider';
import { AuthFailure, useSetUserDisabled, useSetUserRole, useUsers, type SiteRoleName, type UserRow } from '~/lib/api/queries/admin';

type Props = { currentUserId: string; pageSize?: number };

const column = createColumnHelper<UserRow>();

function failureText(e: unknown): string {
  return e instanceof AuthFailure ? authErrorMessage(e.error) : errorMessages.network_error;
}


function UsersTable({ currentUserId, pageSize = 25 }: Props) {
  const [offset, setOffset] = useState(0);
  const [search, setSearch] = useState('');
  const [draft, setDraft] = useState('');
  const [busyId, setBusyId] = useState<string | null>(null);
  const [actionError, setActionError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const [sorting, setSorting] = useState<SortingState>([]);

  const users = useUsers({ limit: pageSize, offset, search });
  const rows = useMemo(() => users.data?.rows ?? [], [users.data]);
  const total = users.data?.total ?? 0;
  const loading = users.isFetching;
  const error = actionError ?? (users.error ? failureText(users.error) : null);
  const setRole = useSetUserRole();
  const setDisabled = useSetUserDisabled();

  const act = useCallback(async (row: UserRow, run: () => Promise<void>, done: string) => {
    setBusyId(row.id);
    setActionError(null);
    setStatus(null);
    try {
      await run();
      setStatus(done);
    } catch (e) {
      setActionError(failureText(e));
    } finally {
      setBusyId(null);
    }
  }, []);
  const { mutateAsync: changeRole } = setRole;
  const { mutateAsync: changeDisabled } = setDisabled;

  const columns = useMemo(
    () => [
      column.accessor('name', {
        header: 'Name',
        cell: (c) => (
          <span className="font-medium">
            {c.getValue() || '—'}
            {c.row.original.id === currentUserId && <span className="ml-1 text-sm font-normal text-ink-soft">(you)</span>}
          </span>
        ),
      }),
      column.accessor('email', {
        header: 'E-mail',
        cell: (c) => (
          <span className="break-all">
            {c.getValue()}
            {!c.row.original.emailVerified && <span className="ml-1 text-sm text-ink-soft">(not confirmed)</span>}
          </span>
        ),
      }),
      column.accessor('role', {
        header: 'Role',
        cell: (c) => {
          const u = c.row.original;
          const self = u.id === currentUserId;
          return (
            <select
              className="cw-input min-h-9 w-auto py-1"
              aria-label={`Role of ${u.email}`}
              value={u.role}
              disabled={self || busyId === u.id}
              title={self ? 'You cannot change your own role.' : undefined}
              onChange={(e) => {
                const role = e.target.value as SiteRoleName;
                void act(u, () => changeRole({ userId: u.id, role }), `${u.email} is now ${role === 'admin' ? 'an administrator' : 'a member'}.`);
              }}
            >
              <option value="member">Member</option>
              <option value="admin">Administrator</option>
            </select>
          );
        },
      }),
      column.accessor('disabled', {
        header: 'Status',
        cell: (c) =>
          c.getValue() ? (
            <span className="font-medium text-fault">Disabled</span>
          ) : (
            <span className="text-sound">Active</span>
          ),
      }),
      column.accessor('createdAt', { header: 'Joined', cell: (c) => <LocalDate iso={c.getValue()} /> }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const u = c.row.original;
          if (u.id === currentUserId) return null;
          return (
            <button
              type="button"
              className="cw-btn cw-btn-quiet cw-btn-small"
              disabled={busyId === u.id}
              onClick={() =>
                void act(
                  u,
                  () => changeDisabled({ userId: u.id, disabled: !u.disabled }),
                  u.disabled ? `${u.email} can sign in again.` : `${u.email} is disabled and signed out.`,
                )
              }
            >
              {u.disabled ? 'Enable' : 'Disable'}
              <span className="sr-only"> {u.email}</span>
            </button>
          );
        },
      }),
    ],
    [act, busyId, changeDisabled, changeRole, currentUserId],
  );

  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });

  function onSearch(e: SubmitEvent<HTMLFormElement>) {
    e.preventDefault();
    setOffset(0);
    setSearch(draft);
  }

  const from = total === 0 ? 0 : offset + 1;
  const to = Math.min(offset + rows.length, total);

  return (
    <div className="space-y-4">
      <form role="search" onSubmit={onSearch} className="flex flex-wrap items-end gap-2">
        <div className="min-w-0 flex-1">
          <label htmlFor="user-search" className="cw-label">
            Find by e-mail
          </label>
          <input
            id="user-search"
            type="search"
            className="cw-input"
            value={draft}
            onChange={(e) => setDraft(e.target.value)}
            autoComplete="off"
          />
        </div>
        <button type="submit" className="cw-btn cw-btn-quiet">
          Search
        </button>
      </form>

      <FormMessage error={error} success={status} />

      <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
        <table className="w-full min-w-[44rem] border-collapse text-left">
          <caption className="sr-only">Accounts on this site</caption>
          <SortableTableHead table={table} />
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-rule last:border-b-0" data-user-id={r.original.id}>
                {r.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-middle">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {!loading && rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-soft">
                  {search ? `No account matches “${search}”.` : 'No accounts yet.'}
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>

      <div className="flex flex-wrap items-center justify-between gap-2 text-sm">
        <p aria-live="polite">{loading ? 'Loading…' : `${from}–${to} of ${total}`}</p>
        <div className="flex gap-2">
          <button
            type="button"
            className="cw-btn cw-btn-quiet cw-btn-small"
            disabled={loading || offset === 0}
            onClick={() => setOffset(Math.max(0, offset - pageSize))}
          >
            Previous
          </button>
          <button
            type="button"
            className="cw-btn cw-btn-quiet cw-btn-small"
            disabled={loading || offset + rows.length >= total}
            onClick={() => setOffset(offset + pageSize)}
          >
            Next
          </button>
        </div>
      </div>
    </div>
  );
}

/** Accounts on this site: find by e-mail, change a role, disable or enable. */
export default withApi(UsersTable);
