import { useSearchParams } from 'react-router-dom';
import { ResetConfirmPage } from './reset-confirm-page';
import { ResetRequestPage } from './reset-request-page';

/** /reset-password asks for the e-mail; the e-mailed link (?token=…) asks for the new password. */
export function ResetPasswordPage() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return token ? <ResetConfirmPage token={token} /> : <ResetRequestPage />;
}
