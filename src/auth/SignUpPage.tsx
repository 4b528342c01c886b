import { Link } from 'react-router-dom';
import { signupBody } from '../../shared/schemas/auth';
import { TimeZoneInput } from '../settings/TimeZoneInput';
import { browserTimeZone } from '../time/nurseryTime';
import { Field, Input } from '../ui/Field';
import { FormActions } from '../ui/FormActions';
import { useZodForm } from '../ui/useZodForm';
import { AuthLayout } from './AuthLayout';
import { PasswordInput } from './PasswordInput';
import { useSignUp } from './queries';

export function SignUpPage() {
  const signUp = useSignUp();
  const { register, handleSubmit, formState } = useZodForm(signupBody, {
    defaultValues: { nurseryName: '', name: '', email: '', password: '', timeZone: browserTimeZone() },
  });
  const { errors } = formState;
  const aside = (
    <section aria-labelledby="next-steps" className="rounded-lg border border-frost-deep bg-frost/60 p-5">
      <h2 id="next-steps" className="text-lg font-bold text-slate-deep">
        After this
      </h2>
      <ol className="mt-2 list-decimal space-y-1 pl-5 text-ink-soft">
        <li>Add the rooms where grafts are kept: cellar, garage, fridge.</li>
        <li>Add your temperature loggers and place each in its room.</li>
        <li>Invite the people who work with you, as staff or viewers.</li>
      </ol>
    </section>
  );
  return (
    <AuthLayout title="Create a nursery" intro="You become its owner and can invite your crew afterwards." aside={aside}>
      <form noValidate onSubmit={handleSubmit((body) => signUp.mutate(body))} className="flex flex-col gap-4">
        <Field label="Nursery name" error={errors.nurseryName?.message}>
          {(c) => <Input {...c} {...register('nurseryName')} autoComplete="organization" />}
        </Field>
        <Field label="Time zone" hint="Readings and moves are shown on this clock." error={errors.timeZone?.message}>
          {(c) => <TimeZoneInput {...c} {...register('timeZone')} />}
        </Field>
        <Field label="Your name" error={errors.name?.message}>
          {(c) => <Input {...c} {...register('name')} autoComplete="name" />}
        </Field>
        <Field label="E-mail" error={errors.email?.message}>
          {(c) => <Input {...c} {...register('email')} type="email" autoComplete="email" />}
        </Field>
        <Field label="Password" hint="At least 10 characters; a few words strung together work well." error={errors.password?.message}>
          {(c) => <PasswordInput {...c} {...register('password')} autoComplete="new-password" />}
        </Field>
        <FormActions submitLabel="Create nursery" busyLabel="Creating…" busy={signUp.isPending} error={signUp.error} wide />
      </form>
      <p className="mt-6 text-ink-soft">
        Already have an account?{' '}
        <Link to="/sign-in" className="font-semibold text-slate underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
