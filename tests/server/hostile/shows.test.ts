import { describeHostileInput } from '../../support/hostile-file';

describeHostileInput('shows');
