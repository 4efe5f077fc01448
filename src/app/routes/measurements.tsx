import { MeasurementsPage } from '../../features/measurements/components/measurements-page';
import { useWorkspace } from '../../lib/workspace-context';

/** The workspace's measurements and the upload form. */
export default function MeasurementsRoute() {
  return <MeasurementsPage scope={useWorkspace()} />;
}
