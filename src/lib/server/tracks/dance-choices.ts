// The catalogue's dances as the music page offers them: for the dance filter and the bulk
// "mark selected for the dance" action.
import { asc } from 'drizzle-orm';
import { db } from '../db';
import { dances } from '../db/schema';

export const danceChoices = () =>
	db()
		.select({ id: dances.id, name: dances.name, meter: dances.meter })
		.from(dances)
		.orderBy(asc(dances.name))
		.all();
