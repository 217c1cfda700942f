// The demo scenario: an invented club, its team and its venue. Every name here is made up.

export const CLUB = {
	name: 'Alder Row Boot & Buckle Club',
	venue: 'Quillbrook Assembly Rooms, 14 Tansy Lane, Marrowby'
};

export const DEMO_PASSWORD = 'floorset-demo';

export const PEOPLE = [
	{ email: 'admin@floorset.test', name: 'Maren Oakby', roles: ['admin'] },
	{ email: 'organiser@floorset.test', name: 'Tobias Wrenfield', roles: ['organiser'] },
	{ email: 'dj@floorset.test', name: 'Priya Castellane', roles: ['dj'] },
	{ email: 'instructor@floorset.test', name: 'Dolores Fenwright', roles: ['instructor'] },
	{ email: 'dancer@floorset.test', name: 'Sam Quillon', roles: ['dancer'] }
] as const;
