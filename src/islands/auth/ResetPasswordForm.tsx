import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages, toErrorCode } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { resetSchema } from './schemas';

type Props = { token: string };
type Values = z.input<typeof resetSchema>;

export default function ResetPasswordForm({ token }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const { register, handleSubmit, formState, setError } = useForm<Values, unknown, z.output<typeof resetSchema>>({
    resolver: zodResolver(resetSchema),
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    try {
      const { error } = await authClient.resetPassword({ newPassword: v.password, token });
      if (error) {
        const code = toErrorCode(error.code);
        if (code === 'password_too_short' || code === 'password_too_long') {
          setError('password', { message: authErrorMessage(error) });
        } else {
          setFormError(authErrorMessage(error));
        }
        return;
      }
      setDone(true);
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  if (done) {
    return (
      <div className="space-y-4">
        <p role="status" className="cw-success">
          Your password is changed. Sign in with the new one; other devices were signed out.
        </p>
        <a href="/sign-in" className="cw-btn cw-btn-primary w-full">
          Sign in
        </a>
      </div>
    );
  }

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Choose a new password">
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        error={errors.confirm?.message}
        {...register('confirm')}
      />
      <FormMessage error={formError} />
      <SubmitButton pending={isSubmitting} pendingLabel="Saving…" className="w-full">
        Save the new password
      </SubmitButton>
    </form>
  );
}
