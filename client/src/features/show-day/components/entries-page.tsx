import { useMemo, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { ENTRY_STATUSES, ENTRY_STATUS_LABELS } from '@shared/constants';
import { formatMoney } from '@shared/calc/money';
import { formatInZone } from '@shared/calc/time-zone';
import { waitingListWords } from '@shared/words';
import { PAYMENT_ISSUE_SHORT_LABEL, PAYMENT_STATE_LABELS, type EntryTableQuery, type EntryTableRow, type EntryTableSort } from '@shared/schemas/show-day';
import { useShow } from '../api/get-show';
import { entryTableParams, useEntryTable } from '../api/list-entry-table';
import { PageHeader } from '@client/components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '@client/components/ui/states';
import { Button } from '@client/components/ui/button';
import { EntryDetail } from './entry-detail';
import { NumberedCardsPanel } from './numbered-cards-panel';
import { MoneyTotalsPanel } from './money-totals-panel';

const column = createColumnHelper<EntryTableRow>();
const PAGE_SIZE = 50;

/** The organiser's entries table: paging, sort, filter and search all happen on the server. */
export function EntriesPage() {
  const eventId = Number(useParams().id);
  const show = useShow(eventId);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'number', desc: false }]);
  const [filters, setFilters] = useState<{ classId: string; status: string; q: string }>({ classId: '', status: '', q: '' });
  const [page, setPage] = useState(1);
  const [openId, setOpenId] = useState<number | null>(null);
  const query: EntryTableQuery = {
    page,
    pageSize: PAGE_SIZE,
    sort: (sorting[0]?.id ?? 'number') as EntryTableSort,
    dir: sorting[0]?.desc ? 'desc' : 'asc',
    classId: filters.classId ? Number(filters.classId) : undefined,
    status: (filters.status || undefined) as EntryTableQuery['status'],
    q: filters.q || undefined,
  };
  const table = useEntryTable(eventId, query);
  const timeZone = show.data?.timeZone ?? 'UTC';

  const columns = useMemo(
    () => [
      column.accessor('number', { id: 'number', header: 'No.', cell: (c) => c.getValue() ?? '—' }),
      column.accessor('buildTitle', {
        id: 'title',
        header: 'Build',
        cell: (c) => (
          <button type="button" className="min-h-11 text-left font-semibold underline underline-offset-4" onClick={() => setOpenId(c.row.original.id)}>
            {c.getValue()}
          </button>
        ),
      }),
      column.accessor('ownerName', { id: 'owner', header: 'Entrant' }),
      column.accessor('className', { id: 'class', header: 'Class' }),
      column.accessor('status', { id: 'status', header: 'Status', cell: (c) => ENTRY_STATUS_LABELS[c.getValue()] }),
      column.accessor('payment', {
        header: 'Payment',
        enableSorting: false,
        cell: (c) => {
          const r = c.row.original;
          const label = PAYMENT_STATE_LABELS[c.getValue()];
          const text = c.getValue() === 'refund_due' ? `${label} ${formatMoney(r.refundDue ?? 0, r.currency)}` : label;
          return r.paymentIssues.length ? <>{text} <strong className="text-danger">· {PAYMENT_ISSUE_SHORT_LABEL}</strong></> : text;
        },
      }),
      column.accessor('checkedInAt', { header: 'Arrived', enableSorting: false, cell: (c) => (c.getValue() ? formatInZone(c.getValue()!, timeZone, { timeStyle: 'short' }) : '') }), // on the show's clock
      column.accessor('waitingPosition', { header: 'Waiting', enableSorting: false, cell: (c) => waitingListWords(c.row.original, timeZone) }),
    ],
    [timeZone],
  );
  const rt = useReactTable({
    data: table.data?.rows ?? [],
    columns,
    manualSorting: true,
    manualPagination: true,
    manualFiltering: true,
    pageCount: table.data?.pageCount ?? 1,
    state: { sorting },
    onSortingChange: (u) => {
      setSorting(u);
      setPage(1);
    },
    getCoreRowModel: getCoreRowModel(),
  });
  const setFilter = (k: keyof typeof filters, v: string) => {
    setFilters((f) => ({ ...f, [k]: v }));
    setPage(1);
  };
  const csvHref = `/api/events/${eventId}/entries.csv?${entryTableParams({ sort: query.sort, dir: query.dir, classId: query.classId, status: query.status, q: query.q })}`;
  const open = table.data?.rows.find((r) => r.id === openId) ?? null;

  return (
    <div>
      <PageHeader title={`Entries${show.data ? ` · ${show.data.name}` : ''}`}>
        Every entry with its payment and arrival. Open a build to change its class, mark it paid, move it up or withdraw it; each change is kept in its history.{' '}
        <Link className="underline" to={`/gate/${eventId}`}>Gate</Link>
      </PageHeader>
      <MoneyTotalsPanel eventId={eventId} />
      {show.data ? <NumberedCardsPanel eventId={eventId} classes={show.data.classes} /> : null}
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1">
          <span className="text-sm font-semibold">Search</span>
          <input type="search" aria-label="Search entries" placeholder="Title, entrant, e-mail or number" value={filters.q} onChange={(e) => setFilter('q', e.target.value)} className="min-h-11 w-72 border border-rule bg-white px-3" />
        </label>
        <label className="flex flex-col gap-1">
          <span className="text-sm font-semibold">Class</span>
          <select aria-label="Class" value={filters.classId} onChange={(e) => setFilter('classId', e.target.value)} className="min-h-11 border border-rule bg-white px-2">
            <option value="">All classes</option>
            {show.data?.classes.map((c) => <option key={c.id} value={c.id}>{c.name}</option>)}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          <span className="text-sm font-semibold">Status</span>
          <select aria-label="Status" value={filters.status} onChange={(e) => setFilter('status', e.target.value)} className="min-h-11 border border-rule bg-white px-2">
            <option value="">All statuses</option>
            {ENTRY_STATUSES.map((s) => <option key={s} value={s}>{ENTRY_STATUS_LABELS[s]}</option>)}
          </select>
        </label>
        <a href={csvHref} download className="inline-flex min-h-11 items-center border-2 border-ink px-4 font-display uppercase tracking-wide hover:bg-ink hover:text-paper">Export CSV</a>
      </div>
      {table.isPending ? <LoadingState label="Loading entries…" /> : null}
      {table.error ? <ErrorState error={table.error} onRetry={() => void table.refetch()} /> : null}
      {table.data && table.data.total === 0 ? <EmptyState title="No entries match">Clear the search or the filters.</EmptyState> : null}
      {table.data && table.data.total > 0 ? (
        <>
          <div className="overflow-x-auto border border-rule bg-white">
            <table className="w-full text-left tabular-nums">
              <thead className="border-b border-rule">
                {rt.getHeaderGroups().map((hg) => (
                  <tr key={hg.id}>
                    {hg.headers.map((h) => {
                      const sorted = h.column.getIsSorted();
                      return (
                        <th key={h.id} scope="col" aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined} className="px-3 py-2 font-display text-sm uppercase tracking-wide">
                          {h.column.getCanSort() ? (
                            <button type="button" className="min-h-11 uppercase" onClick={h.column.getToggleSortingHandler()}>
                              {flexRender(h.column.columnDef.header, h.getContext())}
                              {sorted ? (sorted === 'asc' ? ' ▲' : ' ▼') : ''}
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
              <tbody>
                {rt.getRowModel().rows.map((row) => (
                  <tr key={row.id} className="border-b border-rule last:border-0">
                    {row.getVisibleCells().map((cell) => (
                      <td key={cell.id} className="px-3 py-1">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="mt-3 flex items-center gap-3">
            <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>Previous</Button>
            <span className="tabular-nums">Page {table.data.page} of {table.data.pageCount} · {table.data.total} entries</span>
            <Button variant="secondary" disabled={page >= table.data.pageCount} onClick={() => setPage((p) => p + 1)}>Next</Button>
          </div>
        </>
      ) : null}
      {open && show.data ? <EntryDetail eventId={eventId} row={open} classes={show.data.classes} timeZone={show.data.timeZone} onClose={() => setOpenId(null)} /> : null}
    </div>
  );
}
