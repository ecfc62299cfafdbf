import { loginBodySchema } from '@shared/schemas/auth';
import { Button } from '@/components/ui/button';
import { Field, Form, useSchemaForm } from '@/components/ui/form';
import { useLogin } from '../api/login';

/** Sign-in on the API's own login schema: a missing e-mail or password is said by its field before anything is sent. */
export function SignInForm({ onSignedIn }: { onSignedIn: () => void }) {
  const form = useSchemaForm(loginBodySchema, { defaultValues: { email: '', password: '' } });
  const login = useLogin();
  return (
    <Form
      form={form}
      onSubmit={(body) => login.mutate(body, { onSuccess: onSignedIn })}
      serverError={login.error}
      className="flex flex-col gap-4"
      aria-label="Sign in"
    >
      <Field name="email" label="E-mail" type="email" autoComplete="username" required autoFocus />
      <Field name="password" label="Password" type="password" autoComplete="current-password" required />
      <Button type="submit" disabled={login.isPending} className="py-2 text-base">
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </Form>
  );
}
