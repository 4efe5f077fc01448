import { readConfig } from '../config';
import { restoreDatabase } from './backup';

// `npm run db:restore -- FILE`: checks a backup, then puts it back as DATABASE_PATH.
const source = process.argv[2];
if (!source) {
  process.stderr.write('usage: npm run db:restore -- FILE\n');
  process.exit(2);
}
try {
  const { databasePath, databaseUrl } = readConfig();
  if (databaseUrl) {
    // This command copies the SQLite file only; PostgreSQL has its own tools for a consistent copy.
    process.stderr.write('db:restore works on the SQLite file only; DATABASE_URL is set, so use PostgreSQL\'s own tool: pg_restore --clean --if-exists --dbname="$DATABASE_URL" FILE\n');
    process.exit(2);
  }
  const check = await restoreDatabase(source, databasePath);
  process.stdout.write(`restored ${source} into ${databasePath} (integrity ok, ${check.migrations.length} migrations)\n`);
} catch (error) {
  process.stderr.write(`restore failed: ${(error as Error).message}\n`);
  process.exit(1);
}
