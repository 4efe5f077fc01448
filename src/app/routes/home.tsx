import { Link } from 'react-router-dom';
import { ExampleResults } from '../../features/examples/components/example-results';
import { useMe } from '../../lib/auth';
import { paths } from '../paths';

/** The start page: what the product does, and a worked example computed in the browser. */
export default function Home() {
  const me = useMe();
  const first = me.data?.memberships[0];
  return (
    <div className="space-y-5">
      <section className="max-w-3xl">
        <h1 className="text-2xl font-semibold tracking-tight">Which lamps cost least for the same light?</h1>
        <p className="mt-1 text-ink-soft">
          Photon Parity levels every lighting option to the same PPFD over your canopy, then adds up what each one costs over the years:
          fixtures, installation, relamping, electricity, cooling and demand charges, discounted to today.
        </p>
        <p className="mt-2">
          {me.data?.user ? (
            first ? (
              <Link className="font-medium text-spruce-700 underline" to={paths.scenarios.to(first.workspaceId)}>
                Open your scenarios in {first.name}
              </Link>
            ) : (
              <Link className="font-medium text-spruce-700 underline" to={paths.workspaces.to()}>
                Create your first workspace
              </Link>
            )
          ) : (
            <>
              <Link className="font-medium text-spruce-700 underline" to={paths.signIn.to()}>Sign in</Link> or{' '}
              <Link className="font-medium text-spruce-700 underline" to={paths.signUp.to()}>create an account</Link> to build your own comparison.
            </>
          )}
        </p>
      </section>
      <section aria-labelledby="worked-example">
        <h2 id="worked-example" className="mb-2 text-lg font-semibold">
          Worked example (invented data)
        </h2>
        <ExampleResults />
      </section>
    </div>
  );
}
