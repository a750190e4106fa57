import { resolve } from 'node:path';
import { readEnv } from '../env';
import { BackupError } from './database-file';
import { restoreDatabase } from './restore';

/** `npm run restore FILE`: puts a backup back in place of DATABASE_PATH while Gripline is stopped. */
const env = readEnv();
const [file] = process.argv.slice(2);
if (!file) {
  console.error('Name the backup to restore: npm run restore data/backups/gripline-2026-12-03T0300.db');
  process.exit(1);
}
try {
  // npm runs scripts from the project folder; a relative FILE means the folder it was typed in.
  const { keptAs } = restoreDatabase({ file: resolve(process.env.INIT_CWD ?? process.cwd(), file), databasePath: env.DATABASE_PATH, now: new Date() });
  console.log(`Restored ${env.DATABASE_PATH} from ${file}.${keptAs ? ` The database it replaced is kept as ${keptAs}.` : ''} Start Gripline again.`);
} catch (err) {
  if (!(err instanceof BackupError)) throw err;
  console.error(`Nothing was restored. ${err.message}`);
  process.exitCode = 1;
}
