import { matrixFile } from './matrix-file';
import { SHOW_FOREIGN, SHOW_ROWS } from './rows-shows';

// The authorization matrix (matrix.ts), part 3: running show A, its people, entering, the entry table and the gate.
matrixFile('shows', SHOW_ROWS, SHOW_FOREIGN);
