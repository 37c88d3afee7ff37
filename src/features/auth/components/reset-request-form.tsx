import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { resetRequestSchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/form-errors';
import { useRequestPasswordReset, type ResetRequestInput } from '../api/request-password-reset';

export function ResetRequestForm() {
  const form = useForm<ResetRequestInput>({
    resolver: zodResolver(resetRequestSchema),
    defaultValues: { email: '' },
  });
  const [formError, setFormError] = useState<string | null>(null);
  const reset = useRequestPasswordReset();
  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    reset.mutate(input, {
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['email'])),
    });
  });

  if (reset.isSuccess) {
    return (
      <Notice tone="success" title="Check your e-mail">
        {reset.data.message}
      </Notice>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        autoFocus
        error={form.formState.errors.email?.message}
        {...form.register('email')}
      />
      <div className="flex justify-end">
        <Button type="submit" variant="primary" busy={reset.isPending}>
          Send the reset link
        </Button>
      </div>
    </form>
  );
}
