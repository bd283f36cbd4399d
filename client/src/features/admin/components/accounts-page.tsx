import { useCallback, useState } from 'react';
import { useUsers } from '../api/list-users';
import { useSession } from '@client/features/session/api/get-session';
import { PageHeader } from '@client/components/ui/page-header';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { AccountPanel } from './account-panel';
import { AccountsTable } from './accounts-table';
import { AccountCards } from './account-cards';
import { accountsSummary } from './accounts-summary';

const PAGE_SIZE = 25;

export function AccountsPage() {
  const [q, setQ] = useState('');
  const [page, setPage] = useState(1);
  const [openId, setOpenId] = useState<number | null>(null);
  const { data: session } = useSession();
  const selfId = session?.user?.id ?? 0;
  const { data, isPending, error, refetch, isFetching, isPlaceholderData } = useUsers({ q, page, pageSize: PAGE_SIZE });
  const search = q.trim();
  const onOpen = useCallback((id: number) => setOpenId(id), []);
  const pages = data ? Math.max(1, Math.ceil(data.total / PAGE_SIZE)) : 1;

  return (
    <div>
      <PageHeader title="Accounts">Grant the right to create shows. Per-show roles (organiser, judge, gate) are given inside each show.</PageHeader>
      <label className="mb-2 flex max-w-md flex-col gap-1">
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
      {/* The count belongs to the answer on screen: while a new search runs, the old list stays and the line says so. */}
      <p role="status" className="mb-4 min-h-6 text-graphite">
        {data ? (isPlaceholderData ? 'Searching…' : accountsSummary(data.total, search)) : null}
      </p>
      {isPending ? <LoadingState label="Loading accounts…" /> : null}
      {error ? <ErrorState error={error} onRetry={() => void refetch()} /> : null}
      {data && data.users.length === 0 && search ? <p className="text-graphite">Try part of a name or an e-mail.</p> : null}
      {data && data.users.length > 0 ? (
        <>
          {/* Below 1024 px each account is a card; from there up the table fits its box. */}
          <div className="lg:hidden">
            <AccountCards users={data.users} selfId={selfId} onOpen={onOpen} busy={isFetching} />
          </div>
          <div className="hidden lg:block">
            <AccountsTable users={data.users} selfId={selfId} onOpen={onOpen} busy={isFetching} />
          </div>
        </>
      ) : null}
      {data && data.total > PAGE_SIZE ? (
        <div className="mt-4 flex flex-wrap items-center gap-3">
          <Button variant="secondary" disabled={page <= 1} onClick={() => setPage((p) => p - 1)}>
            Previous
          </Button>
          <span>
            Page {page} of {pages}
          </span>
          <Button variant="secondary" disabled={page >= pages} onClick={() => setPage((p) => p + 1)}>
            Next
          </Button>
        </div>
      ) : null}
      {openId !== null ? <AccountPanel key={openId} id={openId} selfId={selfId} onClose={() => setOpenId(null)} /> : null}
      <div className="mt-6">
        <Notice>Removing a site admin or disabling an account needs a confirmation; you cannot do either to yourself.</Notice>
      </div>
    </div>
  );
}
