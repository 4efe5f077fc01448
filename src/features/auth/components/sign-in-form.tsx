import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from '../../../contracts/zod-messages';
import { emailSchema } from '../../../contracts/api/common';
import { Button } from '../../../components/ui/button';
import { Field } from '../../../components/ui/field';
import { Input } from '../../../components/ui/input';
import { Notice } from '../../../components/ui/notice';
import { errorMessage } from '../../../lib/api-client';
import { useSendSignInLink } from '../api/send-sign-in-link';
import { useSignIn } from '../api/sign-in';

const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { error: 'is required' }),
});
type SignInValues = z.input<typeof signInSchema>;

/** E-mail and password, or a one-time link by e-mail. Typed input stays on any error. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const form = useForm<SignInValues, unknown, z.output<typeof signInSchema>>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const signIn = useSignIn();
  const link = useSendSignInLink();
  const [linkSentTo, setLinkSentTo] = useState<string | null>(null);
  const errors = form.formState.errors;

  const sendLink = async () => {
    const ok = await form.trigger('email');
    if (!ok) return;
    const email = form.getValues('email');
    link.mutate({ email }, { onSuccess: () => setLinkSentTo(email) });
  };

  return (
    <form noValidate className="space-y-3" onSubmit={form.handleSubmit((v) => signIn.mutate(v, { onSuccess: onSignedIn }))}>
      <Field label="E-mail address" error={errors.email?.message && `E-mail address ${errors.email.message}.`}>
        <Input type="email" autoComplete="email" {...form.register('email')} />
      </Field>
      <Field label="Password" error={errors.password?.message && `Password ${errors.password.message}.`}>
        <Input type="password" autoComplete="current-password" {...form.register('password')} />
      </Field>
      {signIn.isError ? <Notice tone="error">{errorMessage(signIn.error)}</Notice> : null}
      {link.isError ? <Notice tone="error">{errorMessage(link.error)}</Notice> : null}
      {linkSentTo ? <Notice tone="ok">A sign-in link is on its way to {linkSentTo}. It works once and expires soon.</Notice> : null}
      <div className="flex flex-wrap items-center gap-2">
        <Button type="submit" tone="primary" busy={signIn.isPending}>
          Sign in
        </Button>
        <Button tone="quiet" busy={link.isPending} onClick={() => void sendLink()}>
          E-mail me a sign-in link instead
        </Button>
      </div>
    </form>
  );
}
