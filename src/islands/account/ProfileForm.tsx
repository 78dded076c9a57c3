import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages } from '~/lib/errors';
import { TextField } from '~/components/ui/TextField';
import { FormMessage } from '~/components/ui/FormMessage';
import { SubmitButton } from '~/components/ui/SubmitButton';
import { nameField } from '../auth/schemas';

const profileSchema = z.object({ name: nameField });
type Values = z.input<typeof profileSchema>;

type Props = { name: string; email: string };

export default function ProfileForm({ name, email }: Props) {
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values, unknown, z.output<typeof profileSchema>>({
    resolver: zodResolver(profileSchema),
    defaultValues: { name },
  });
  const { errors, isSubmitting } = formState;

  const onSubmit = handleSubmit(async (v) => {
    setFormError(null);
    setSaved(null);
    try {
      const { error } = await authClient.updateUser({ name: v.name });
      if (error) {
        setFormError(authErrorMessage(error));
        return;
      }
      setSaved('Name saved.');
    } catch {
      setFormError(errorMessages.network_error);
    }
  });

  return (
    <form method="post" onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Profile">
      {/* defaultValue as well, so the server-rendered field already shows the name before the island starts. */}
      <TextField
        label="Name"
        type="text"
        autoComplete="name"
        defaultValue={name}
        error={errors.name?.message}
        {...register('name')}
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        value={email}
        readOnly
        hint="The address you sign in with."
      />
      <FormMessage error={formError} success={saved} />
      <SubmitButton pending={isSubmitting} pendingLabel="Saving…">
        Save name
      </SubmitButton>
    </form>
  );
}
