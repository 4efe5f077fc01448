import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';
import * as m0001 from './0001-app-meta';
import * as m0002 from './0002-accounts';
import * as m0003 from './0003-workspaces';
import * as m0004 from './0004-library-and-scenarios';
import * as m0005 from './0005-measurements';
import * as m0006 from './0006-snapshots';
import * as m0007 from './0007-scenario-analysis';
import * as m0008 from './0008-snapshot-analysis';
import * as m0009 from './0009-withdrawn-links';

/** One migration: a stable name and its up and down steps. */
export interface Migration {
  name: string;
  up: MigrationFn<MigrationContext>;
  down: MigrationFn<MigrationContext>;
}

/** Every migration in the order it runs. Append only; never edit one that has shipped. */
export const migrations: Migration[] = [
  { name: '0001-app-meta', ...m0001 },
  { name: '0002-accounts', ...m0002 },
  { name: '0003-workspaces', ...m0003 },
  { name: '0004-library-and-scenarios', ...m0004 },
  { name: '0005-measurements', ...m0005 },
  { name: '0006-snapshots', ...m0006 },
  { name: '0007-scenario-analysis', ...m0007 },
  { name: '0008-snapshot-analysis', ...m0008 },
  { name: '0009-withdrawn-links', ...m0009 },
];
