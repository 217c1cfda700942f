// `npm run db:backup [FILE]`: a consistent copy of the live database, safe while the app serves.
import { applyEnvDefaults } from './env';
import { backupDatabase, integrityOf } from '../src/lib/server/backup';

applyEnvDefaults();
const stamp = new Date().toISOString().replace(/[:.]/g, '-');
const target = process.argv[2] ?? `data/backups/floorset-${stamp}.db`;
const { pages } = await backupDatabase(process.env.DATABASE_URL!, target);
console.log(
	`Backed up ${process.env.DATABASE_URL} to ${target} (${pages} pages, integrity ${integrityOf(target)}).`
);
