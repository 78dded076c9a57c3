import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { signInSchema } from './schemas';
import { safeNext } from '../../lib/safe-next';

type Props = { next: string };
type Values = z.input<typeof signInSchema>;

export default function SignInForm({ next }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values, unknown, z.output<typeof signInSchema>>({
    resolver: zodResolver(signInSchema),
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const { error } = await authClient.signIn.email({ email: v.email, password: v.password });
      if (error) {
        setFormError(authErrorMessage(error));
        return;
      }
      window.location.assign(safeNext(next, '/designs'));
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Sign in">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...register('password')}
      />
      <FormMessage error={formError} />
      <SubmitButton pending={isSubmitting} pendingLabel="Signing in…" className="w-full">
        Sign in
      </SubmitButton>
    </form>
  );
}
