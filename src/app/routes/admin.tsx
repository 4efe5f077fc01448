import { useParams } from 'react-router-dom';
import { AdminPage } from '../../features/admin/components/admin-page';
import NotFound from './not-found';

/** Site administration: /admin/mail and /admin/accounts; any other section is not a page. */
export default function AdminRoute() {
  const { section } = useParams();
  if (section !== 'mail' && section !== 'accounts') return <NotFound />;
  return <AdminPage section={section} />;
}
