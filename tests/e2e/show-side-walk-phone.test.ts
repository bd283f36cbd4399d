import { describeShowSideWalk } from '../support/show-side-walk';

describeShowSideWalk('phone', { viewport: { width: 390, height: 844 }, isMobile: true, hasTouch: true });
