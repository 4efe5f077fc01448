import { readConfig } from '../config';
import { restoreDatabase } from './backup';

// `npm run db:restore -- FILE`: checks a backup, then puts it back as DATABASE_PATH.
const source = process.argv[2];
if (!source) {
  process.stderr.write('usage: npm run db:restore -- FILE\n');
  process.exit(2);
}
try {
  const { databasePath } = readConfig();
  const check = await restoreDatabase(source, databasePath);
  process.stdout.write(`restored ${source} into ${databasePath} (integrity ok, ${check.migrations.length} migrations)\n`);
} catch (error) {
  process.stderr.write(`restore failed: ${(error as Error).message}\n`);
  process.exit(1);
}
