import { Link } from 'react-router-dom';
import { loginBody } from '../../shared/schemas/auth';
import { useMeta, type Meta } from '../meta/queries';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { RoleBadge } from '../ui/RoleBadge';
import { useZodForm } from '../ui/useZodForm';
import { AuthLayout } from './AuthLayout';
import { PasswordInput } from './PasswordInput';
import { useSignIn } from './queries';

function DemoSignIns({ accounts, onPick }: { accounts: Meta['demoSignIns']; onPick: (email: string, password: string) => void }) {
  return (
    <section aria-labelledby="demo-heading" className="rounded-lg border border-callus/40 bg-callus-light/60 p-5">
      <h2 id="demo-heading" className="text-lg font-bold text-slate-deep">
        Trying the demo?
      </h2>
      <p className="mt-1 text-ink-soft">
        This server runs with an invented nursery. Pick an account to fill in the form, then sign in. Each role sees a different amount.
      </p>
      <ul className="mt-3 flex flex-col gap-2">
        {accounts.map((a) => (
          <li key={a.email}>
            <button
              type="button"
              onClick={() => onPick(a.email, a.password)}
              className="flex w-full flex-wrap items-center justify-between gap-2 rounded-md border border-slate/30 bg-white px-3 py-2 text-left hover:bg-frost"
            >
              <span className="font-mono text-sm break-all">{a.email}</span>
              <RoleBadge role={a.role} />
            </button>
          </li>
        ))}
      </ul>
      <p className="mt-3 text-sm text-ink-soft">
        Password for all of them: <span className="font-mono">{accounts[0]?.password}</span>
      </p>
    </section>
  );
}

export function SignInPage() {
  const meta = useMeta();
  const signIn = useSignIn();
  const { register, handleSubmit, setValue, formState } = useZodForm(loginBody, { defaultValues: { email: '', password: '' } });
  const { errors } = formState;

  const aside = meta.data?.demo && meta.data.demoSignIns.length > 0 && (
    <DemoSignIns
      accounts={meta.data.demoSignIns}
      onPick={(email, password) => {
        setValue('email', email, { shouldValidate: true });
        setValue('password', password, { shouldValidate: true });
      }}
    />
  );

  return (
    <AuthLayout title="Sign in" intro="Check on your cold rooms and the grafts in them." aside={aside}>
      <form noValidate onSubmit={handleSubmit((body) => signIn.mutate(body))} className="flex flex-col gap-4">
        <Field label="E-mail" error={errors.email?.message}>
          {(c) => <Input {...c} {...register('email')} type="email" autoComplete="username" />}
        </Field>
        <Field label="Password" error={errors.password?.message}>
          {(c) => <PasswordInput {...c} {...register('password')} autoComplete="current-password" />}
        </Field>
        <FormActions submitLabel="Sign in" busyLabel="Signing in…" busy={signIn.isPending} error={signIn.error} wide />
      </form>
      <p className="mt-6 text-ink-soft">
        Setting up a new nursery?{' '}
        <Link to="/sign-up" className="font-semibold text-slate underline underline-offset-4">
          Create an account
        </Link>
      </p>
      {meta.data?.devMail && (
        <p className="mt-2 text-sm text-ink-soft">
          Development server: mail it sends is kept in{' '}
          <Link to="/dev/mail" className="text-slate underline underline-offset-4">
            Captured mail
          </Link>
          .
        </p>
      )}
    </AuthLayout>
  );
}
