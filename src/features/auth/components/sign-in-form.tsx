import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { signInSchema, type SignInInput } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { paths } from '@/config/paths';
import { useSignIn } from '@/lib/auth';
import { applyServerErrors } from '@/lib/form-errors';

export type SignInFormProps = { defaultEmail?: string; onSignedIn: () => void };

export function SignInForm({ defaultEmail = '', onSignedIn }: SignInFormProps) {
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<SignInInput>({
    resolver: zodResolver(signInSchema),
    defaultValues: { email: defaultEmail, password: '' },
  });
  const { errors } = form.formState;
  const signIn = useSignIn({ onSuccess: onSignedIn });

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    signIn.mutate(input, {
      // 401 is the server's generic "e-mail or password is not correct"; 429 says how long to wait.
      onError: (error) => setFormError(applyServerErrors(error, form.setError, ['email', 'password'])),
    });
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        autoFocus={!defaultEmail}
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        autoFocus={Boolean(defaultEmail)}
        error={errors.password?.message}
        {...form.register('password')}
      />
      <div className="flex items-center justify-between pt-1">
        <Link to={paths.resetRequest.href()} className="text-accent-700 underline">
          Forgot your password?
        </Link>
        <Button type="submit" variant="primary" busy={signIn.isPending}>
          Sign in
        </Button>
      </div>
    </form>
  );
}
