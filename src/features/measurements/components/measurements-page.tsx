import type { WorkspaceScope } from '../../../lib/workspace-context';
import { Panel } from '../../../components/ui/panel';
import { MeasurementList } from './measurement-list';
import { UploadForm } from './upload-form';

/** The workspace's measurements, and for editors the form to upload another. */
export function MeasurementsPage({ scope }: { scope: WorkspaceScope }) {
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-semibold">Measurements</h1>
      <p className="max-w-3xl text-ink-soft">
        PPFD readings taken over a canopy and spectra from a spectroradiometer, turned into the figures the trade uses. The file is kept as uploaded, with its SHA-256, and a measurement can set a library fixture's efficacy or spectrum.
      </p>
      {scope.canEdit ? (
        <Panel title="Upload a measurement">
          <UploadForm workspaceId={scope.workspaceId} />
        </Panel>
      ) : null}
      <Panel title="Uploaded measurements">
        <MeasurementList workspaceId={scope.workspaceId} />
      </Panel>
    </div>
  );
}
