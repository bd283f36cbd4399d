import type { AdminUser } from '@shared/schemas/user';
import { formatDate, formatDateTime } from '@shared/words';

export const AccountStatus = ({ user }: { user: AdminUser }) =>
  user.disabledAt ? <span className="font-semibold text-danger">Disabled</span> : <>Active</>;

/** Date and time as two unbreakable halves, so a narrow cell wraps between them and never inside a date. */
export function LastSignIn({ user }: { user: AdminUser }) {
  if (!user.lastSignInAt) return <>Never</>;
  const [date, time] = formatDateTime(user.lastSignInAt).split(' ');
  return (
    <span className="tabular-nums">
      <span className="whitespace-nowrap">{date}</span> <span className="whitespace-nowrap">{time}</span>
    </span>
  );
}

export const Joined = ({ user }: { user: AdminUser }) => <span className="whitespace-nowrap tabular-nums">{formatDate(user.createdAt)}</span>;
