// Who reads which evenings: the team reads every evening, dancers only published ones.
import type { Role } from '../../domain';
import { holds } from '../guard';
import type { SessionUser } from '../users';

const TEAM: readonly Role[] = ['admin', 'organiser', 'dj', 'instructor'];

/** Whether this person may read draft evenings (everyone on the team; not dancers). */
export const readsDrafts = (user: SessionUser) => user.roles.some((r) => TEAM.includes(r));

/** Whether this person may change evenings, their sections and run orders. */
export const editsEvenings = (user: SessionUser) => holds(user, 'evenings');

/** Whether this person may read this evening. */
export const mayRead = (user: SessionUser, evening: { published: boolean }) =>
	evening.published || readsDrafts(user);
