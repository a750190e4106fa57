import BetterSqlite3 from 'better-sqlite3';
import { readEnv } from '../env';
import { BackupError } from './database-file';
import { backupDirFor, takeBackup } from './take-backup';

/** `npm run backup`: an online copy of DATABASE_PATH into BACKUP_DIR, safe while Gripline runs. */
const env = readEnv();
let source: BetterSqlite3.Database | undefined;
try {
  source = new BetterSqlite3(env.DATABASE_PATH, { fileMustExist: true, timeout: 5000 });
  const { file, pages } = await takeBackup(source, backupDirFor(env), new Date());
  console.log(`Backed up ${env.DATABASE_PATH} to ${file} (${pages} pages, integrity checked).`);
} catch (err) {
  const reason = err instanceof BackupError ? err.message : `${env.DATABASE_PATH}: ${(err as Error).message}`;
  console.error(`No backup was made. ${reason}`);
  process.exitCode = 1;
} finally {
  source?.close();
}
