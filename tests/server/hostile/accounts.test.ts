import { describeHostileInput } from '../../support/hostile-file';

describeHostileInput('accounts');
