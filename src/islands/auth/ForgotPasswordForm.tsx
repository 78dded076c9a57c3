import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { forgotSchema } from './schemas';

type Values = z.input<typeof forgotSchema>;

export default function ForgotPasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [sentTo, setSentTo] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values, unknown, z.output<typeof forgotSchema>>({
    resolver: zodResolver(forgotSchema),
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    setSentTo(null);
    try {
      const { error } = await authClient.requestPasswordReset({ email: v.email, redirectTo: '/reset-password' });
      if (error) {
        setFormError(authErrorMessage(error));
        return;
      }
      setSentTo(v.email);
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  // The same answer whether or not the address has an account, so the form does not reveal who is registered.
  const success = sentTo
    ? `If ${sentTo} belongs to an account, a message with a link to choose a new password is on its way. The link works for one hour.`
    : null;

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Reset your password">
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        inputMode="email"
        error={errors.email?.message}
        {...register('email')}
      />
      <FormMessage error={formError} success={success} />
      <SubmitButton pending={isSubmitting} pendingLabel="Sending…" className="w-full">
        Send the reset link
      </SubmitButton>
    </form>
  );
}
