// `npm run db:restore FILE`: puts a backup back as the live database. Stop the app first.
import { applyEnvDefaults } from './env';
import { restoreDatabase } from '../src/lib/server/backup';

applyEnvDefaults();
const file = process.argv[2];
if (!file) {
	console.error('Usage: npm run db:restore FILE');
	process.exit(2);
}
await restoreDatabase(file, process.env.DATABASE_URL!);
console.log(`Restored ${file} into ${process.env.DATABASE_URL}.`);
