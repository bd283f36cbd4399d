import { useMemo } from 'react';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { AdminUser } from '@shared/schemas/user';
import { Button } from '@client/components/ui/button';
import { RoleToggle, ROLE_LABELS } from './role-toggle';
import { AccountStatus, Joined, LastSignIn } from './account-status';

const column = createColumnHelper<AdminUser>();

// Fixed widths for the short columns; the account (name over e-mail) takes what is left and wraps,
// so the table always fits its box from 1024 px up and never scrolls sideways.
const WIDTHS: Record<string, string> = { createdAt: 'w-28', lastSignInAt: 'w-28', disabledAt: 'w-24', mayOrganise: 'w-28', isSiteAdmin: 'w-28', open: 'w-24' };

/** The desk-sized list of accounts: one row each, every column inside the box. */
export function AccountsTable({ users, selfId, onOpen, busy }: { users: AdminUser[]; selfId: number; onOpen: (id: number) => void; busy: boolean }) {
  const columns = useMemo(
    () => [
      column.display({
        id: 'account',
        header: 'Account',
        cell: (c) => (
          <>
            <span className="block font-semibold wrap-anywhere">{c.row.original.name}</span>
            <span className="block text-sm text-graphite wrap-anywhere">{c.row.original.email}</span>
          </>
        ),
      }),
      column.accessor('createdAt', { header: 'Joined', cell: (c) => <Joined user={c.row.original} /> }),
      column.accessor('lastSignInAt', { header: 'Last sign-in', cell: (c) => <LastSignIn user={c.row.original} /> }),
      column.accessor('disabledAt', { header: 'Status', cell: (c) => <AccountStatus user={c.row.original} /> }),
      column.display({ id: 'mayOrganise', header: ROLE_LABELS.mayOrganise, cell: (c) => <RoleToggle user={c.row.original} role="mayOrganise" selfId={selfId} /> }),
      column.display({ id: 'isSiteAdmin', header: ROLE_LABELS.isSiteAdmin, cell: (c) => <RoleToggle user={c.row.original} role="isSiteAdmin" selfId={selfId} /> }),
      column.display({
        id: 'open',
        header: () => <span className="sr-only">Open</span>,
        cell: (c) => (
          <Button variant="secondary" className="px-3" aria-label={`Open ${c.row.original.name}`} onClick={() => onOpen(c.row.original.id)}>
            Open
          </Button>
        ),
      }),
    ],
    [selfId, onOpen],
  );
  const table = useReactTable({ data: users, columns, getCoreRowModel: getCoreRowModel() });

  return (
    <div className="border border-rule bg-white/60" data-testid="accounts-table-box" aria-busy={busy}>
      <table className="w-full table-fixed border-collapse text-left">
        <thead>
          {table.getHeaderGroups().map((g) => (
            <tr key={g.id} className="border-b-2 border-ink">
              {g.headers.map((h) => (
                <th key={h.id} scope="col" className={`${WIDTHS[h.column.id] ?? ''} px-2 py-2 align-bottom font-display text-sm uppercase tracking-wide first:pl-3`}>
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
                <td key={cell.id} className="px-2 py-2 align-middle text-sm first:pl-3 first:text-base">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
