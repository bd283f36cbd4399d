import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import type { Abilities } from '@shared/schemas/user';
import { useSession } from '@client/features/session/api/get-session';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { Notice } from '@client/components/ui/notice';

/** Shows its children to a signed-in person (with an ability, when one is named); sends others to sign in. */
export function RequireUser({ ability, children }: { ability?: keyof Abilities; children: ReactNode }) {
  const { data, isPending, error, refetch } = useSession();
  const location = useLocation();
  if (isPending) return <LoadingState />;
  if (error) return <ErrorState error={error} onRetry={() => void refetch()} />;
  if (!data.user) return <Navigate to={`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`} replace />;
  if (ability && !data.user.abilities[ability]) return <Notice tone="danger">This page is for site admins.</Notice>;
  return children;
}
