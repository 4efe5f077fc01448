import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Panel } from '../../components/ui/panel';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { paths } from '../paths';

/** Only same-site paths are followed after signing in. */
export function safeNext(next: string | null): string {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : paths.home.to();
}

export default function SignIn() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Sign in">
        <SignInForm onSignedIn={() => void navigate(next)} />
        <p className="mt-4 text-sm text-ink-soft">
          No account yet?{' '}
          <Link className="text-spruce-700 underline" to={paths.signUp.to(params.get('next') ?? undefined)}>
            Create one
          </Link>
        </p>
      </Panel>
    </div>
  );
}
