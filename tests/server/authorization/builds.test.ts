import { matrixFile } from './matrix-file';
import { BUILD_FOREIGN, BUILD_ROWS } from './rows-builds';

// The authorization matrix (matrix.ts), part 2: an owner's builds and everything on them.
matrixFile('builds', BUILD_ROWS, BUILD_FOREIGN);
