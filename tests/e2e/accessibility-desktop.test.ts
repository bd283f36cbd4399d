import { describeAccessibility } from '../support/axe-screens';

// Every screen of every role through axe on a desktop; the show side is checked inside the show-side walk.
describeAccessibility('desktop', { viewport: { width: 1366, height: 900 } });
