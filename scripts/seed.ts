// `npm run seed`: migrates the database and seeds the invented demo club if it is empty.
import { applyEnvDefaults } from './env';
import { db } from '../src/lib/server/db';
import { storage } from '../src/lib/server/storage';
import { seedDemo } from '../seeds/seed';

applyEnvDefaults();

export async function seed() {
	return seedDemo(db(), {
		storage: storage(),
		cacheDir: process.env.SEED_CACHE_DIR!,
		log: (line) => console.log(line)
	});
}

if (import.meta.url === `file://${process.argv[1]}`) {
	await seed();
	db().$client.close();
}
