import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages, toErrorCode } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { newPasswordField } from '../auth/schemas';

const passwordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password.'),
    newPassword: newPasswordField,
    confirm: z.string().min(1, 'Repeat the new password.'),
  })
  .refine((v) => v.newPassword === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
type Values = z.input<typeof passwordSchema>;

type Props = { email: string };

export default function PasswordForm({ email }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const { register, handleSubmit, formState, setError, reset } = useForm<Values, unknown, z.output<typeof passwordSchema>>({
    resolver: zodResolver(passwordSchema),
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    setSaved(null);
    try {
      const { error } = await authClient.changePassword({
        currentPassword: v.currentPassword,
        newPassword: v.newPassword,
        revokeOtherSessions: true,
      });
      if (error) {
        const code = toErrorCode(error.code);
        if (code === 'invalid_password') setError('currentPassword', { message: authErrorMessage(error) });
        else if (code === 'password_too_short' || code === 'password_too_long')
          setError('newPassword', { message: authErrorMessage(error) });
        else setFormError(authErrorMessage(error));
        return;
      }
      reset();
      setSaved('Password changed. Your other devices were signed out.');
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Change password">
      {/* Lets password managers pair the new password with this account. */}
      <input type="email" name="username" autoComplete="username" value={email} hidden readOnly />
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        error={errors.newPassword?.message}
        {...register('newPassword')}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        error={errors.confirm?.message}
        {...register('confirm')}
      />
      <FormMessage error={formError} success={saved} />
      <SubmitButton pending={isSubmitting} pendingLabel="Changing…">
        Change password
      </SubmitButton>
    </form>
  );
}
