import { readConfig } from '../config';
import { backupDatabase } from './backup';

// `npm run db:backup -- FILE`: an online copy of DATABASE_PATH, safe while the server runs.
const dest = process.argv[2];
if (!dest) {
  process.stderr.write('usage: npm run db:backup -- FILE\n');
  process.exit(2);
}
try {
  const { databasePath, databaseUrl } = readConfig();
  if (databaseUrl) {
    // This command copies the SQLite file only; PostgreSQL has its own tools for a consistent copy.
    process.stderr.write('db:backup works on the SQLite file only; DATABASE_URL is set, so use PostgreSQL\'s own tool: pg_dump --format=custom --file=FILE "$DATABASE_URL"\n');
    process.exit(2);
  }
  const check = await backupDatabase(databasePath, dest);
  process.stdout.write(`backed up ${databasePath} to ${dest} (integrity ok, ${check.migrations.length} migrations)\n`);
} catch (error) {
  process.stderr.write(`backup failed: ${(error as Error).message}\n`);
  process.exit(1);
}
