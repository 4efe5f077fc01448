import { useMutation, useQueryClient } from '@tanstack/react-query';
import { setCsrfToken } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { postAuthForm } from './auth-form';

export interface SignInInput {
  email: string;
  password: string;
}

/** Signs in with e-mail and password through Auth.js's credentials provider. */
export async function signIn(input: SignInInput): Promise<void> {
  await postAuthForm(apiPaths.authCredentials(), { email: input.email, password: input.password, callbackUrl: '/' });
  setCsrfToken(undefined);
}

/** After signing in, everything cached belonged to nobody: drop it all. */
export function useSignIn() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: signIn, onSuccess: () => qc.resetQueries() });
}
