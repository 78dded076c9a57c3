import { useState } from 'react';
import { authClient } from '~/lib/auth-client';
import { authErrorMessage, errorMessages } from '~/lib/errors';
import { FormMessage } from '~/components/ui/FormMessage';

type Props = { email: string };

export default function ResendVerification({ email }: Props) {
  const [pending, setPending] = useState(false);
  const [formError, setFormError] = useState<string | null>(null);
  const [sent, setSent] = useState<string | null>(null);

  async function resend() {
    setPending(true);
    setFormError(null);
    setSent(null);
    try {
      const { error } = await authClient.sendVerificationEmail({ email, callbackURL: '/account' });
      if (error) setFormError(authErrorMessage(error));
      else setSent(`A new confirmation link is on its way to ${email}.`);
    } catch {
      setFormError(errorMessages.network_error);
    } finally {
      setPending(false);
    }
  }

  return (
    <div className="space-y-3">
      <button type="button" className="cw-btn cw-btn-quiet" onClick={resend} disabled={pending} aria-busy={pending}>
        {pending ? 'Sending…' : 'Send the confirmation link again'}
      </button>
      <FormMessage error={formError} success={sent} />
    </div>
  );
}
