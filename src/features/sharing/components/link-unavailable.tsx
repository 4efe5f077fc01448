import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';

/** A plain page for a share link that was withdrawn, has expired (410) or never existed (404). */
export function LinkUnavailable({ status, reason }: { status: number; reason?: string }) {
  const gone = status === 410;
  return (
    <div className="max-w-2xl py-8">
      <h1 className="text-xl font-semibold">{gone ? 'This shared snapshot is no longer available' : 'No shared snapshot here'}</h1>
      <p className="mt-2">
        {gone
          ? reason === 'expired'
            ? 'This link had an expiry date, and it has passed.'
            : 'The people who published this comparison have withdrawn the link.'
          : 'There is no shared snapshot at this address. Check the link you were sent.'}
      </p>
      <p className="mt-2">If you still need the figures, ask the person who sent you the link for a new one.</p>
      <p className="mt-4">
        <Link className="text-spruce-700 underline" to={paths.home.to()}>Go to the start page</Link>
      </p>
    </div>
  );
}
