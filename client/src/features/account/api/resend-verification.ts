import { useMutation } from '@tanstack/react-query';
import { api } from '@client/lib/api';

export const resendVerification = () => api<{ message: string }>('/api/account/email-verification', { method: 'POST' });
export const useResendVerification = () => useMutation({ mutationFn: resendVerification });
