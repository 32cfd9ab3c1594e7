import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { sessionQuery, type MeResponse, type SessionUser } from '@/lib/session';

interface Message {
  message: string;
}

export interface SignUpInput {
  email: string;
  password: string;
  displayName: string;
}

export interface SignInInput {
  email: string;
  password: string;
}

/**
 * Everything cached belongs to the previous person: drop it, then tell the (always mounted) session
 * query who is signed in now. The session query itself is updated in place, never removed, so the
 * header's observers keep listening to it.
 */
function useStartOver() {
  const queryClient = useQueryClient();
  const sessionKey = sessionQuery().queryKey;
  return (me: MeResponse) => {
    queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== sessionKey[0] });
    queryClient.setQueryData(sessionKey, me);
  };
}

export function useSignUp() {
  return useMutation({
    mutationFn: (input: SignUpInput) => apiRequest<Message>('/auth/register', { method: 'POST', body: input }),
  });
}

export function useSignIn() {
  const startOver = useStartOver();
  return useMutation({
    mutationFn: (input: SignInInput) => apiRequest<MeResponse>('/auth/login', { method: 'POST', body: input }),
    onSuccess: startOver,
  });
}

export function useSignOut() {
  const startOver = useStartOver();
  return useMutation({
    mutationFn: () => apiRequest<null>('/auth/logout', { method: 'POST' }),
    onSuccess: () => startOver({ user: null }),
  });
}

/** Confirms the address; if this browser is signed in as that user, the session learns it too. */
export function useVerifyEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => apiRequest<MeResponse>('/auth/verify-email', { method: 'POST', body: { token } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQuery().queryKey }),
  });
}

export function useResendVerification() {
  return useMutation({
    mutationFn: () => apiRequest<Message>('/auth/verify-email/resend', { method: 'POST' }),
  });
}

export function useForgotPassword() {
  return useMutation({
    mutationFn: (email: string) => apiRequest<Message>('/auth/password/forgot', { method: 'POST', body: { email } }),
  });
}

export function useResetPassword() {
  return useMutation({
    mutationFn: (input: { token: string; password: string }) =>
      apiRequest<Message>('/auth/password/reset', { method: 'POST', body: input }),
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (input: { currentPassword: string; newPassword: string }) =>
      apiRequest<Message>('/auth/password/change', { method: 'POST', body: input }),
  });
}

export function useChangeEmail() {
  return useMutation({
    mutationFn: (input: { newEmail: string; password: string }) =>
      apiRequest<Message>('/auth/email/change', { method: 'POST', body: input }),
  });
}

export function useConfirmEmail() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => apiRequest<MeResponse>('/auth/email/confirm', { method: 'POST', body: { token } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionQuery().queryKey }),
  });
}

export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<Pick<SessionUser, 'displayName' | 'preferredUnits'>>) =>
      apiRequest<SessionUser>('/users/me', { method: 'PATCH', body: input }),
    onSuccess: (user) => queryClient.setQueryData(sessionQuery().queryKey, { user }),
  });
}
