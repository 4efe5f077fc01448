import { Navigate, useParams } from 'react-router-dom';
import { paths } from '../paths';

/** A bare workspace address opens its scenarios. */
export default function WorkspaceIndex() {
  const { wid = '' } = useParams();
  return <Navigate replace to={paths.scenarios.to(wid)} />;
}
