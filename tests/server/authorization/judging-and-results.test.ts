import { matrixFile } from './matrix-file';
import { JUDGING_FOREIGN, JUDGING_ROWS } from './rows-judging';

// The authorization matrix (matrix.ts), part 4: show A's judging, numbered cards, people's choice and results.
matrixFile('judging and results', JUDGING_ROWS, JUDGING_FOREIGN);
