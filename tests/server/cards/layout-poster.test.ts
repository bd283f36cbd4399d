import { describeCardLayouts } from './card-layout-checks';

describeCardLayouts('poster');
