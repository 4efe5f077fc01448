import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { signUpRequestSchema } from '../../../contracts/api/account';
import type { SignUpRequest } from '../../../contracts/api/account';
import { PASSWORD_MIN_LENGTH } from '../../../contracts/api/account';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { useSignUp } from '../api/sign-up';

/** Creates an account and signs it in; server-side field problems appear beside their fields. */
export function SignUpForm({ onSignedUp }: { onSignedUp: () => void }) {
  const form = useForm<SignUpRequest>({ resolver: zodResolver(signUpRequestSchema), defaultValues: { name: '', email: '', password: '' } });
  const signUp = useSignUp();
  const errors = form.formState.errors;
  const submit = form.handleSubmit((v) =>
    signUp.mutate(v, {
      onSuccess: onSignedUp,
      onError: (e) => {
        if (e instanceof ApiError) for (const f of e.fields) if (f.path === 'email' || f.path === 'password' || f.path === 'name') form.setError(f.path, { message: f.message });
      },
    }),
  );
  return (
    <form noValidate className="space-y-3" onSubmit={submit}>
      <Field label="Your name" error={errors.name?.message && `Name ${errors.name.message}.`}>
        <Input autoComplete="name" {...form.register('name')} />
      </Field>
      <Field label="E-mail address" error={errors.email?.message && `E-mail address ${errors.email.message}.`}>
        <Input type="email" autoComplete="email" {...form.register('email')} />
      </Field>
      <Field label="Password" hint={`At least ${PASSWORD_MIN_LENGTH} characters.`} error={errors.password?.message && `Password ${errors.password.message}.`}>
        <Input type="password" autoComplete="new-password" {...form.register('password')} />
      </Field>
      {signUp.isError ? <Notice tone="error">{errorMessage(signUp.error)}</Notice> : null}
      <Button type="submit" tone="primary" busy={signUp.isPending}>
        Create the account
      </Button>
    </form>
  );
}
