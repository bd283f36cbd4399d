import type { AdminUser } from '@shared/schemas/user';
import { Button } from '@client/components/ui/button';
import { RoleToggle, ROLE_LABELS, type AccountRole } from './role-toggle';
import { AccountStatus, Joined, LastSignIn } from './account-status';

const ROLES: AccountRole[] = ['mayOrganise', 'isSiteAdmin'];

/** Phones and tablets: one card per account, each value under its label and each switch on the same line as its role. */
export function AccountCards({ users, selfId, onOpen, busy }: { users: AdminUser[]; selfId: number; onOpen: (id: number) => void; busy: boolean }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-2" aria-busy={busy}>
      {users.map((u) => (
        <li key={u.id} aria-labelledby={`account-card-${u.id}`} className="flex flex-col gap-3 border border-rule bg-white/60 p-3">
          <div className="flex items-start justify-between gap-3">
            <h2 id={`account-card-${u.id}`} className="min-w-0 pt-2 text-lg font-semibold wrap-anywhere">{u.name}</h2>
            <Button variant="secondary" className="shrink-0 px-3" aria-label={`Open ${u.name}`} onClick={() => onOpen(u.id)}>
              Open
            </Button>
          </div>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
            <dt className="font-semibold">E-mail</dt>
            <dd className="min-w-0 wrap-anywhere">{u.email}</dd>
            <dt className="font-semibold">Status</dt>
            <dd><AccountStatus user={u} /></dd>
            <dt className="font-semibold">Joined</dt>
            <dd><Joined user={u} /></dd>
            <dt className="font-semibold">Last sign-in</dt>
            <dd><LastSignIn user={u} /></dd>
          </dl>
          <div className="divide-y divide-rule border-t border-rule">
            {ROLES.map((role) => (
              <div key={role} className="flex items-center justify-between gap-3 py-2 last:pb-0">
                <span className="text-sm font-semibold">{ROLE_LABELS[role]}</span>
                <RoleToggle user={u} role={role} selfId={selfId} />
              </div>
            ))}
          </div>
        </li>
      ))}
    </ul>
  );
}
