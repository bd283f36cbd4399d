// The judge's phone's words about arrival (kept free of zod: the phone's screens are in the first download).

/** The heading over the judge's cars the gate has not checked in yet. */
export const EXPECTED_CARS_HEADING = 'Still expected at the gate';
/** The mark on such a car. */
export const EXPECTED_CAR_MARK = 'Not arrived';
/** Why they are listed and why they cannot be scored yet. */
export const EXPECTED_CARS_EXPLAINED = 'Only cars the gate has checked in are judged. These may still come: once checked in, they move up to your cars.';

/** "My cars: 2 of 5 scored", counting only cars that arrived, and how many are still expected. */
export function myCarsSummary(scored: number, arrived: number, expected: number): string {
  return `My cars: ${scored} of ${arrived} scored${expected ? ` · ${expected} still expected` : ''}`;
}

/** Why a car that holds a place but has not arrived cannot be scored; the phone shows the server's refusal as it is. */
export function notArrivedReason(numbers: number[]): string {
  const cars = numbers.length === 1 ? `No. ${numbers[0]} has` : `Nos. ${numbers.join(', ')} have`;
  return `${cars} not arrived: only cars the gate has checked in are judged.`;
}
