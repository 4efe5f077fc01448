import { describeDatabase, readConfig } from '../config';
import { openConfiguredDatabase } from './connection';
import { migrateUp, migrationState } from './migrate';

// `npm run db:migrate`: applies pending migrations to DATABASE_URL or DATABASE_PATH without starting the server.
try {
  const config = readConfig();
  const sequelize = await openConfiguredDatabase(config);
  try {
    const applied = await migrateUp(sequelize);
    const state = await migrationState(sequelize);
    process.stdout.write(`${describeDatabase(config)}: applied ${applied.length} (${applied.join(', ') || 'none pending'}); ${state.applied} in all\n`);
  } finally {
    await sequelize.close();
  }
} catch (error) {
  process.stderr.write(`migration failed: ${(error as Error).message}\n`);
  process.exit(1);
}
