import { Link } from 'react-router-dom';
import { paths } from '../../../app/paths';
import { useMe } from '../../../lib/auth';

/** The header's way into site administration, shown to site admins only. */
export function AdminLink() {
  const me = useMe();
  if (!me.data?.user?.isSiteAdmin) return null;
  return (
    <Link className="text-white underline underline-offset-2 hover:text-gold-100" to={paths.admin.to('mail')}>
      Site admin
    </Link>
  );
}
