import type { AdminUser } from '@shared/schemas/user';
import { useUpdateUserRoles } from '../api/update-user-roles';

export type AccountRole = 'mayOrganise' | 'isSiteAdmin';
export const ROLE_LABELS: Record<AccountRole, string> = { mayOrganise: 'May organise', isSiteAdmin: 'Site admin' };

/** A yes/no switch for one role of one account; its accessible name says which role and whose ("Site admin: Sam Ferrier"). */
export function RoleToggle({ user, role, selfId }: { user: AdminUser; role: AccountRole; selfId: number }) {
  const update = useUpdateUserRoles();
  const on = user[role];
  const label = ROLE_LABELS[role];
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
