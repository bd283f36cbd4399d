/** The demo scenario's people (invented). Printed by `npm start`; the .test domain never delivers mail. */
export const DEMO_ACCOUNTS = [
  { email: 'admin@placard.test', password: 'demo-admin', name: 'Noor Halvorsen', role: 'site admin', isSiteAdmin: true, mayOrganise: true },
  { email: 'organiser@placard.test', password: 'demo-organiser', name: 'Jo Calloway', role: 'organiser', isSiteAdmin: false, mayOrganise: true },
  { email: 'judge@placard.test', password: 'demo-judge', name: 'Dee Marsh', role: 'judge', isSiteAdmin: false, mayOrganise: false },
  { email: 'owner@placard.test', password: 'demo-owner', name: 'Sam Ferrier', role: 'owner', isSiteAdmin: false, mayOrganise: false },
] as const;
