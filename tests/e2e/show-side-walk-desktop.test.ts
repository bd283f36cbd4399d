import { describeShowSideWalk } from '../support/show-side-walk';

describeShowSideWalk('desktop', { viewport: { width: 1366, height: 900 } });
