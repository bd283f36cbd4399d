import type { PublicBuild } from '../schemas/build';

/** The owner's title leads, with the model year in front when the title leaves it out; the body line sits above it. */
export function headlineOf(b: Pick<PublicBuild, 'title' | 'modelYear' | 'bodyOrigin'>): { heading: string; kicker: string | null } {
  const year = b.modelYear ? String(b.modelYear) : '';
  return { heading: year && !b.title.includes(year) ? `${year} ${b.title}` : b.title, kicker: b.bodyOrigin?.trim() || null };
}
