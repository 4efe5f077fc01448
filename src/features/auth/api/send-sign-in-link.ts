import { useMutation } from '@tanstack/react-query';
import { apiPaths } from '../../../lib/api-paths';
import { postAuthForm } from './auth-form';

/** Asks Auth.js to e-mail a one-time sign-in link to the address. */
export async function sendSignInLink(input: { email: string; callbackUrl?: string }): Promise<void> {
  await postAuthForm(apiPaths.authEmail(), { email: input.email, callbackUrl: input.callbackUrl ?? '/' });
}

export function useSendSignInLink() {
  return useMutation({ mutationFn: sendSignInLink });
}
