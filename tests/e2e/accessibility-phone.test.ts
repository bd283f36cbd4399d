import { describeAccessibility } from '../support/axe-screens';

// Every screen of every role through axe on a phone; the show side is checked inside the show-side walk.
describeAccessibility('phone', { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
