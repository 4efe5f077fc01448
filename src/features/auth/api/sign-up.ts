import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signUpRequestSchema, signUpResponseSchema } from '../../../contracts/api/account';
import type { SignUpRequest, SignUpResponse } from '../../../contracts/api/account';
import { apiJson } from '../../../lib/api-client';
import { apiPaths } from '../../../lib/api-paths';
import { signIn } from './sign-in';

export { signUpRequestSchema };

/** POST /api/account/sign-up, then signs the new account in. */
export async function signUp(input: SignUpRequest): Promise<SignUpResponse> {
  const created = await apiJson(apiPaths.signUp(), signUpResponseSchema, { method: 'POST', body: input });
  await signIn({ email: input.email, password: input.password });
  return created;
}

export function useSignUp() {
  const qc = useQueryClient();
  return useMutation({ mutationFn: signUp, onSuccess: () => qc.resetQueries() });
}
