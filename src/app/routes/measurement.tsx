import { useParams } from 'react-router-dom';
import { MeasurementDetail } from '../../features/measurements/components/measurement-detail';
import { useWorkspace } from '../../lib/workspace-context';

/** One measurement's figures, pictures and file. */
export default function MeasurementRoute() {
  const { mid = '' } = useParams();
  return <MeasurementDetail key={mid} scope={useWorkspace()} measurementId={mid} />;
}
