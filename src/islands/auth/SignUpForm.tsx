import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages, toErrorCode } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { signUpSchema } from './schemas';
import { safeNext } from '../../lib/safe-next';

type Props = { next: string };
type Values = z.input<typeof signUpSchema>;

export default function SignUpForm({ next }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError } = useForm<Values, unknown, z.output<typeof signUpSchema>>({
    resolver: zodResolver(signUpSchema),
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const { error } = await authClient.signUp.email({ name: v.name, email: v.email, password: v.password });
      if (error) {
        const code = toErrorCode(error.code);
        // Errors about one field belong under that field; the rest go above the button.
        if (code === 'password_too_short' || code === 'password_too_long') {
          setError('password', { message: authErrorMessage(error) });
        } else if (code === 'invalid_email') {
          setError('email', { message: authErrorMessage(error) });
        } else {
          setFormError(authErrorMessage(error));
        }
        return;
      }
      window.location.assign(safeNext(next, '/designs'));
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Create an account">
      <TextField label="Name" type="text" autoComplete="name" error={errors.name?.message} {...register('name')} />
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
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <FormMessage error={formError} />
      <SubmitButton pending={isSubmitting} pendingLabel="Creating the account…" className="w-full">
        Create account
      </SubmitButton>
    </form>
  );
}
