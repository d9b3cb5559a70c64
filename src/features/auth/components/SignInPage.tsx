import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useNavigate, useSearchParams } from 'react-router';
import { loginSchema, type LoginInput } from '../../../../shared/api/auth';
import { ROLE_LABELS } from '../../../../shared/api/roles';
import {
  Alert,
  Button,
  ErrorMessage,
  Field,
  Input,
  fieldDescriptionIds,
} from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useHealth } from '../api/health';
import { useLogin } from '../api/login';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '../../../../shared/api/demo';
import { BrandMark } from './BrandMark';
import { safeReturnPath } from '../return-path';

/** The sign-in screen at `/sign-in`. */
export function SignInPage() {
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const health = useHealth();
  const loginMutation = useLogin();
  const {
    register,
    handleSubmit,
    formState: { errors },
  } = useForm<LoginInput>({ resolver: zodResolver(loginSchema) });

  const onSubmit = handleSubmit((values) =>
    loginMutation.mutate(values, {
      onSuccess: () => void navigate(safeReturnPath(search.get('from')), { replace: true }),
    }),
  );

  const rateLimited = isApiError(loginMutation.error) && loginMutation.error.status === 429;

  return (
    <main className="flex min-h-screen items-center justify-center bg-sand-100 px-4 py-10">
      <div className="w-full max-w-md">
        <div className="mb-6 flex items-center justify-center gap-3">
          <BrandMark className="h-10 w-10" />
          <span className="text-2xl font-semibold tracking-tight text-timber-800">Spanwise</span>
        </div>
        <div className="rounded-md border border-sand-200 bg-white p-6 shadow-card">
          <h1 className="mb-1 text-xl font-semibold text-sand-900">Sign in</h1>
          <p className="mb-5 text-sm text-sand-600">
            Use the e-mail address your plant set up for you.
          </p>
          <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
            {loginMutation.error ? (
              <ErrorMessage
                error={loginMutation.error}
                title={rateLimited ? 'Too many attempts' : undefined}
              />
            ) : null}
            <Field label="E-mail" htmlFor="email" error={errors.email?.message}>
              <Input
                id="email"
                type="email"
                autoComplete="username"
                autoFocus
                invalid={!!errors.email}
                aria-describedby={fieldDescriptionIds('email', errors.email?.message)}
                {...register('email')}
              />
            </Field>
            <Field label="Password" htmlFor="password" error={errors.password?.message}>
              <Input
                id="password"
                type="password"
                autoComplete="current-password"
                invalid={!!errors.password}
                aria-describedby={fieldDescriptionIds('password', errors.password?.message)}
                {...register('password')}
              />
            </Field>
            <Button type="submit" busy={loginMutation.isPending} className="mt-1 w-full">
              Sign in
            </Button>
          </form>
        </div>
        {health.data?.demo ? (
          <Alert tone="info" title="Demo plant" className="mt-4">
            <p>
              These demo accounts use the password{' '}
              <code className="font-mono font-semibold">{DEMO_PASSWORD}</code>:
            </p>
            <ul className="mt-2 grid gap-1">
              {DEMO_SIGN_INS.map((account) => (
                <li key={account.email} className="flex justify-between gap-3">
                  <span>{ROLE_LABELS[account.role]}</span>
                  <code className="font-mono text-xs">{account.email}</code>
                </li>
              ))}
            </ul>
          </Alert>
        ) : null}
      </div>
    </main>
  );
}
