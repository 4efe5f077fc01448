import type { MigrationFn } from 'umzug';
import type { MigrationContext } from '../migrate';
import * as m0001 from './0001-app-meta';

/** One migration: a stable name and its up and down steps. */
export interface Migration {
  name: string;
  up: MigrationFn<MigrationContext>;
  down: MigrationFn<MigrationContext>;
}

/** Every migration in the order it runs. Append only; never edit one that has shipped. */
export const migrations: Migration[] = [{ name: '0001-app-meta', ...m0001 }];
