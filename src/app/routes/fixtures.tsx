import { FixtureLibrary } from '../../features/fixtures/components/fixture-library';
import { useWorkspace } from '../../lib/workspace-context';

/** The workspace's fixture library. */
export default function FixturesPage() {
  return <FixtureLibrary scope={useWorkspace()} />;
}
