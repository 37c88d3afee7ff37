import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { changePasswordSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useToast } from '@/components/ui/toast';
import { applyServerErrors } from '@/lib/form-errors';
import { useChangePassword } from '../api/change-password';

// The server's schema, plus the repeat that only the screen needs.
const schema = changePasswordSchema
  .extend({ repeat: z.string() })
  .refine((v) => v.newPassword === v.repeat, { path: ['repeat'], message: 'The two new passwords differ.' });
type Values = z.infer<typeof schema>;
const empty: Values = { currentPassword: '', newPassword: '', repeat: '' };

export type ChangePasswordFormProps = { email: string };

export function ChangePasswordForm({ email }: ChangePasswordFormProps) {
  const toast = useToast();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(schema), defaultValues: empty });
  const { errors } = form.formState;
  const change = useChangePassword({
    onSuccess: () => {
      form.reset(empty);
      toast.show('Password changed. Use the new one next time you sign in.');
    },
  });
  const onSubmit = form.handleSubmit(({ currentPassword, newPassword }) => {
    setFormError(null);
    change.mutate(
      { currentPassword, newPassword },
      {
        onError: (error) =>
          setFormError(applyServerErrors(error, form.setError, ['currentPassword', 'newPassword'])),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="max-w-sm space-y-4">
      {/* Lets password managers tie the new password to the right account. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...form.register('currentPassword')}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
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
      <Button type="submit" variant="primary" busy={change.isPending}>
        Change password
      </Button>
    </form>
  );
}
