import { matrixFile } from './matrix-file';
import { PEOPLE_FOREIGN, PEOPLE_ROWS } from './rows-people';

// The authorization matrix (matrix.ts), part 1: sessions, accounts, the site admin, the public JSON and pages.
matrixFile('people and public pages', PEOPLE_ROWS, PEOPLE_FOREIGN);
