import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { acceptInvitationSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useAcceptInvitation } from '../api/accept-invitation';

// The server's schema, plus the repeated password that only the screen needs.
const schema = acceptInvitationSchema
  .extend({ repeat: z.string() })
  .refine((v) => v.password === v.repeat, { path: ['repeat'], message: 'The two passwords differ.' });
type Values = z.input<typeof schema>;

export type AcceptInvitationFormProps = { token: string; email: string; onAccepted: (email: string) => void };

export function AcceptInvitationForm({ token, email, onAccepted }: AcceptInvitationFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values, unknown, z.output<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: { name: '', password: '', repeat: '' },
  });
  const { errors } = form.formState;
  const accept = useAcceptInvitation(token, { onSuccess: (result) => onAccepted(result.email) });
  const onSubmit = form.handleSubmit(({ name, password }) => {
    setFormError(null);
    accept.mutate(
      { name, password },
      { onError: (error) => setFormError(applyServerErrors(error, form.setError, ['name', 'password'])) },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {/* Lets password managers store the new password under the invited address. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="Your name"
        autoComplete="name"
        autoFocus
        hint="As your colleagues will see it."
        error={errors.name?.message}
        {...form.register('name')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="Repeat the password"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...form.register('repeat')}
      />
      <div className="flex justify-end">
        <Button type="submit" variant="primary" busy={accept.isPending}>
          Create my account
        </Button>
      </div>
    </form>
  );
}
