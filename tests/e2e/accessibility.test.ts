import { describeAccessibility } from '../support/axe-screens';
import { DESKTOP, PHONE } from '../support/devices';

// Every screen of every role through axe on a phone and on a desktop, each screen opened once and drawn
// at both sizes; the show side is checked inside the show-side walk.
describeAccessibility([PHONE, DESKTOP]);
