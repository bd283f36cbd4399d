// The short public code in /c/<code>, kept free of zod: the gate's phone screen reads scanned codes with it and
// downloads no schema library on its first load (`npx tsx tests/bench/client-size.ts`).

/** The code's letters: no 0/O, 1/I/L, so it reads aloud and types back. */
export const BUILD_CODE_ALPHABET = '23456789ABCDEFGHJKMNPQRSTUVWXYZ';
export const BUILD_CODE_LENGTH = 7;
