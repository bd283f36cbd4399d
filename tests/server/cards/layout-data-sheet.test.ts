import { describeCardLayouts } from './card-layout-checks';

describeCardLayouts('data-sheet');
