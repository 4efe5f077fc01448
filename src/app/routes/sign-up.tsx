import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { Panel } from '../../components/ui/panel';
import { SignUpForm } from '../../features/auth/components/sign-up-form';
import { paths } from '../paths';
import { safeNext } from './sign-in';

export default function SignUp() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = params.get('next');
  return (
    <div className="mx-auto max-w-md">
      <Panel title="Create an account">
        <SignUpForm onSignedUp={() => void navigate(next ? safeNext(next) : paths.workspaces.to())} />
        <p className="mt-4 text-sm text-ink-soft">
          Already have one?{' '}
          <Link className="text-spruce-700 underline" to={paths.signIn.to(next ?? undefined)}>
            Sign in
          </Link>
        </p>
      </Panel>
    </div>
  );
}
