import { readConfig } from '../config';
import { openDatabase } from './connection';
import { migrateUp, migrationState } from './migrate';

// `npm run db:migrate`: applies pending migrations to DATABASE_PATH without starting the server.
const config = readConfig();
const sequelize = await openDatabase(config.databasePath);
const applied = await migrateUp(sequelize);
const state = await migrationState(sequelize);
process.stdout.write(`${config.databasePath}: applied ${applied.length} (${applied.join(', ') || 'none pending'}); ${state.applied} in all\n`);
await sequelize.close();
