import { useMutation, useQueryClient } from '@tanstack/react-query';
import { setCsrfToken } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { postAuthForm } from './auth-form';

/** Ends the session through Auth.js. */
export async function signOut(): Promise<void> {
  await postAuthForm(apiPaths.authSignOut(), { callbackUrl: '/' });
  setCsrfToken(undefined);
}

export function useSignOut() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: signOut, onSuccess: () => qc.resetQueries() });
}
