import { describeDatabase, readConfig } from '../config';
import { openConfiguredDatabase } from './connection';
import { migrateUp, migrationState } from './migrate';

// `npm run db:migrate`: applies pending migrations to DATABASE_URL or DATABASE_PATH without starting the server.
const config = readConfig();
const sequelize = await openConfiguredDatabase(config);
const applied = await migrateUp(sequelize);
const state = await migrationState(sequelize);
process.stdout.write(`${describeDatabase(config)}: applied ${applied.length} (${applied.join(', ') || 'none pending'}); ${state.applied} in all\n`);
await sequelize.close();
