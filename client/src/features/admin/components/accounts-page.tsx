import { useMemo, useState } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { AdminUser } from '@shared/schemas/user';
import { useUsers } from '../api/list-users';
import { useUpdateUserRoles } from '../api/update-user-roles';
import { useSession } from '@client/features/session/api/get-session';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { countOf, formatDate, formatDateTime } from '@shared/words';
import { AccountPanel } from './account-panel';

const PAGE_SIZE = 25;
const column = createColumnHelper<AdminUser>();

function RoleToggle({ user, role, label, selfId }: { user: AdminUser; role: 'mayOrganise' | 'isSiteAdmin'; label: string; selfId: number }) {
  const update = useUpdateUserRoles();
  const on = user[role];
  const lockedSelf = role === 'isSiteAdmin' && user.id === selfId;
  const toggle = () => {
    if (role === 'isSiteAdmin' && !window.confirm(`${on ? 'Remove' : 'Grant'} site admin for ${user.name}? Site admins manage every account.`)) return;
    update.mutate({ id: user.id, [role]: !on });
  };
  return (
    <div>
      <button
        type="button"
        role="switch"
        aria-checked={on}
        aria-label={`${label}: ${user.name}`}
        disabled={update.isPending || lockedSelf}
        onClick={toggle}
        title={lockedSelf ? 'You cannot remove your own site admin role.' : undefined}
        className={`min-h-11 min-w-20 border-2 px-2 font-display text-sm uppercase ${on ? 'border-ink bg-ink text-paper' : 'border-rule bg-white text-graphite'} disabled:opacity-50`}
      >
        {on ? 'Yes' : 'No'}
      </button>
      {update.error ? <p className="text-sm text-danger">{update.error.message}</p> : null}
    </div>
  );
}

export function AccountsPage() {
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const [openId, setOpenId] = useState<number | null>(null);
  const { data: session } = useSession();
  const selfId = session?.user?.id ?? 0;
  const { data, isPending, error, refetch, isFetching } = useUsers({ q, page, pageSize: PAGE_SIZE });

  const columns = useMemo(
    () => [
      column.accessor('name', { header: 'Name' }),
      column.accessor('email', { header: 'E-mail' }),
      column.accessor('createdAt', { header: 'Joined', cell: (c) => <span className="whitespace-nowrap tabular-nums">{formatDate(c.getValue())}</span> }),
      column.accessor('lastSignInAt', { header: 'Last sign-in', cell: (c) => <span className="whitespace-nowrap tabular-nums">{c.getValue() ? formatDateTime(c.getValue()!) : 'Never'}</span> }),
      column.accessor('disabledAt', { header: 'Status', cell: (c) => (c.getValue() ? <span className="font-semibold text-danger">Disabled</span> : 'Active') }),
      column.display({ id: 'mayOrganise', header: 'May organise', cell: (c) => <RoleToggle user={c.row.original} role="mayOrganise" label="May organise" selfId={selfId} /> }),
      column.display({ id: 'isSiteAdmin', header: 'Site admin', cell: (c) => <RoleToggle user={c.row.original} role="isSiteAdmin" label="Site admin" selfId={selfId} /> }),
      column.display({
        id: 'open',
        header: () => <span className="sr-only">Open</span>,
        cell: (c) => (
          <Button variant="secondary" aria-label={`Open ${c.row.original.name}`} onClick={() => setOpenId(c.row.original.id)}>
            Open
          </Button>
        ),
      }),
    ],
    [selfId],
  );
  const table = useReactTable({ data: data?.users ?? [], columns, getCoreRowModel: getCoreRowModel() });
  const pages = data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1;

  return (
    <div>
      <PageHeader title="Accounts">Grant the right to create shows. Per-show roles (organiser, judge, gate) are given inside each show.</PageHeader>
      <label className="mb-4 flex max-w-md flex-col gap-1">
        <span className="text-sm font-semibold">Search by name or e-mail</span>
        <input
          type="search"
          value={q}
          onChange={(e) => {
            setQ(e.target.value);
            setPage(1);
          }}
          className="min-h-11 border border-rule bg-white px-3"
        />
      </label>
      {isPending ? <LoadingState label="Loading accounts…" /> : null}
      {error ? <ErrorState error={error} onRetry={() => void refetch()} /> : null}
      {data && data.users.length === 0 ? <EmptyState title="No accounts match">Try part of a name or an e-mail.</EmptyState> : null}
      {data && data.users.length > 0 ? (
        <>
        {/* On a phone each account is a block of its own; the table needs a desk-sized screen. */}
        <ul className="divide-y divide-rule border border-rule bg-white/60 md:hidden" aria-busy={isFetching}>
          {data.users.map((u) => (
            <li key={u.id} className="flex flex-col gap-1 p-3">
              <span className="font-semibold">{u.name}</span>
              <span className="break-all text-sm text-graphite">{u.email}</span>
              <span className="text-sm">
                {u.disabledAt ? <span className="font-semibold text-danger">Disabled</span> : 'Active'} · last sign-in{' '}
                {u.lastSignInAt ? formatDateTime(u.lastSignInAt) : 'never'}
              </span>
              <div className="mt-1 flex flex-wrap items-center gap-3">
                <span className="text-sm">May organise</span>
                <RoleToggle user={u} role="mayOrganise" label="May organise" selfId={selfId} />
                <span className="text-sm">Site admin</span>
                <RoleToggle user={u} role="isSiteAdmin" label="Site admin" selfId={selfId} />
                <Button variant="secondary" aria-label={`Open ${u.name}`} onClick={() => setOpenId(u.id)}>
                  Open
                </Button>
              </div>
            </li>
          ))}
        </ul>
        <div className="hidden overflow-x-auto border border-rule bg-white/60 md:block" aria-busy={isFetching}>
          <table className="w-full border-collapse text-left">
            <thead>
              {table.getHeaderGroups().map((g) => (
                <tr key={g.id} className="border-b-2 border-ink">
                  {g.headers.map((h) => (
                    <th key={h.id} scope="col" className="px-3 py-2 font-display text-sm uppercase tracking-wide">
                      {flexRender(h.column.columnDef.header, h.getContext())}
                    </th>
                  ))}
                </tr>
              ))}
            </thead>
            <tbody>
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id} className="border-b border-rule">
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="px-3 py-2 align-middle">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        </>
      ) : null}
      {data && data.total > PAGE_SIZE ? (
        <div className="mt-4 flex items-center gap-3">
          <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Previous
          </Button>
          <span>
            Page {page} of {pages} · {countOf(data.total, 'account')}
          </span>
          <Button variant="secondary" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Next
          </Button>
        </div>
      ) : null}
      {data ? <p className="mt-4 text-sm text-graphite">{countOf(data.total, 'account')} in all.</p> : null}
      {openId !== null ? <AccountPanel key={openId} id={openId} selfId={selfId} onClose={() => setOpenId(null)} /> : null}
      <div className="mt-6">
        <Notice>Removing a site admin or disabling an account needs a confirmation; you cannot do either to yourself.</Notice>
      </div>
    </div>
  );
}
