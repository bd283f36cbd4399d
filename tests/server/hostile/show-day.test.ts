import { describeHostileInput } from '../../support/hostile-file';

// On the show being judged: scores and the gate reach their services.
describeHostileInput('show-day', 'judging');
