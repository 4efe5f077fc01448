import { Link } from 'react-router-dom';
import { paths } from '../paths';

export default function NotFound() {
  return (
    <div className="py-10">
      <h1 className="text-xl font-semibold">There is no page at this address</h1>
      <p className="mt-2">
        <Link className="text-spruce-700 underline" to={paths.home.to()}>
          Go to the start page
        </Link>
      </p>
    </div>
  );
}
