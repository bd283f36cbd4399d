/** The demo's invented shows: no real events, places, clubs or people. */
export const DEMO_SHOW_CLASSES = [
  { name: 'Early iron (to 1948)', description: 'Hot rods, customs and highboys built on bodies up to 1948.', capacity: 12 },
  { name: 'Post-war to 1972', description: 'Muscle, restomods, gassers and customs from 1949 to 1972.', capacity: 16 },
  { name: 'Trucks and wagons', description: 'Pickups, panel vans and wagons of any year.', capacity: 1 },
  { name: 'Open and unfinished', description: 'Anything else, including builds still in primer.', capacity: null },
];

export const DEMO_SHOW_SHEET = [
  { name: 'Paint and bodywork', maxPoints: 20, weight: 1.5, tieBreakOrder: 1 },
  { name: 'Engine bay', maxPoints: 20, weight: 1.25, tieBreakOrder: 2 },
  { name: 'Chassis and underside', maxPoints: 15, weight: 1, tieBreakOrder: 3 },
  { name: 'Interior', maxPoints: 15, weight: 1, tieBreakOrder: null },
  { name: 'Workmanship and detail', maxPoints: 20, weight: 1.5, tieBreakOrder: null },
  { name: 'Stance and overall look', maxPoints: 10, weight: 1, tieBreakOrder: null },
  { name: 'Build sheet and display', maxPoints: 10, weight: 0.5, tieBreakOrder: null },
];

export const DEMO_OPEN_SHOW = {
  name: 'Millpond Valley Rod & Custom Meet',
  slug: 'millpond-valley-meet',
  venueName: 'Millpond Valley fairground, north field',
  venueAddress: 'Fairground Lane, Millpond Valley',
  timeZone: 'America/Chicago',
  capacity: 40,
  entryFee: 2500,
  currency: 'USD',
  description:
    'A one-weekend regional meet for hot rods, customs, trucks and everything between. Gates open at 8 in the morning; judging runs on the first afternoon and the awards are at 3 on the last day.\n\nBring the car clean and the build sheet current: judges read it on their phones while they walk the field.',
};

export const DEMO_FINISHED_SHOW = {
  name: 'Quarry Road Spring Show',
  slug: 'quarry-road-spring-show',
  venueName: 'Old quarry car park',
  venueAddress: 'Quarry Road, Stonebridge',
  timeZone: 'Europe/London',
  capacity: null,
  entryFee: 1500,
  currency: 'GBP',
  description: 'A spring show on the flat ground of the old quarry. Finished: the results, the best of show and the class places are out.',
};
