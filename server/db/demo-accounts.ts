/** The demo scenario's people (invented). Printed by `npm start`; the .test domain never delivers mail. */
export const DEMO_ACCOUNTS = [
  { email: 'admin@placard.test', password: 'demo-admin', name: 'Noor Halvorsen', role: 'site admin', isSiteAdmin: true, mayOrganise: true },
  { email: 'organiser@placard.test', password: 'demo-organiser', name: 'Jo Calloway', role: 'organiser', isSiteAdmin: false, mayOrganise: true },
  { email: 'judge@placard.test', password: 'demo-judge', name: 'Dee Marsh', role: 'judge', isSiteAdmin: false, mayOrganise: false },
  { email: 'owner@placard.test', password: 'demo-owner', name: 'Sam Ferrier', role: 'owner', isSiteAdmin: false, mayOrganise: false },
  { email: 'coorganiser@placard.test', password: 'demo-coorganiser', name: 'Rafe Lindqvist', role: 'co-organiser', isSiteAdmin: false, mayOrganise: true },
  { email: 'judge2@placard.test', password: 'demo-judge2', name: 'Priya Vantongeren', role: 'judge', isSiteAdmin: false, mayOrganise: false },
  { email: 'judge3@placard.test', password: 'demo-judge3', name: 'Tomasz Ekwueme', role: 'judge', isSiteAdmin: false, mayOrganise: false },
  { email: 'gate@placard.test', password: 'demo-gate', name: 'Lou Abernathy', role: 'gate', isSiteAdmin: false, mayOrganise: false },
] as const;
