import { useMutation } from '@tanstack/react-query';
import type { SignUpInput, SignUpResponse } from '@shared/schemas/user';
import { api } from '@client/lib/api';

/** Sign-up signs nobody in: the answer is the same for a new and a known address, and the mail says which. */
export const signUp = (input: SignUpInput) => api<SignUpResponse>('/api/users', { method: 'POST', body: input });

export const useSignUp = () => useMutation({ mutationFn: signUp });
