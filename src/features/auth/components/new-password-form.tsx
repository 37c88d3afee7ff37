import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { passwordSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useCompletePasswordReset } from '../api/complete-password-reset';

// The server's password rule, plus the repeat that only the screen needs.
const schema = z
  .object({ newPassword: passwordSchema, repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { path: ['repeat'], message: 'The two passwords differ.' });

export type NewPasswordFormProps = { token: string; onDone: () => void };

export function NewPasswordForm({ token, onDone }: NewPasswordFormProps) {
  const form = useForm<z.infer<typeof schema>>({
    resolver: zodResolver(schema),
    defaultValues: { newPassword: '', repeat: '' },
  });
  const { errors } = form.formState;
  const [formError, setFormError] = useState<string | null>(null);
  const complete = useCompletePasswordReset({ onSuccess: onDone });
  const onSubmit = form.handleSubmit(({ newPassword }) => {
    setFormError(null);
    complete.mutate(
      { token, newPassword },
      { onError: (error) => setFormError(applyServerErrors(error, form.setError, ['newPassword'])) },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        autoFocus
        hint="At least 10 characters."
        error={errors.newPassword?.message}
        {...form.register('newPassword')}
      />
      <TextField
        label="Repeat the new password"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...form.register('repeat')}
      />
      <div className="flex justify-end">
        <Button type="submit" variant="primary" busy={complete.isPending}>
          Set the new password
        </Button>
      </div>
    </form>
  );
}
