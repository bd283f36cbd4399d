import { z } from 'zod';

/**
 * The owner as results name them: display name, and hometown and club only where the owner gave them.
 * All three are public by the owner's choice; nothing else about the owner is.
 */
export const OwnerCreditSchema = z.object({ name: z.string(), hometown: z.string().nullable(), club: z.string().nullable() });
export type OwnerCredit = z.infer<typeof OwnerCreditSchema>;

/**
 * The credit of an entry: a walk-up (entered at the gate, no account of its own, so the car is held by the
 * show's creator) is credited by the name taken at the gate, with no hometown or club; any other entry by its owner.
 */
export function entryCredit(walkUpName: string | null, owner: OwnerCredit): OwnerCredit {
  return walkUpName ? { name: walkUpName, hometown: null, club: null } : owner;
}

/** "Dana Reyes, Millbrook · Valley Cruisers": the one way every sheet, certificate and read-out names an owner. */
export function ownerCreditWords(owner: OwnerCredit): string {
  const place = [owner.hometown, owner.club].filter((v): v is string => !!v).join(' · ');
  return place ? `${owner.name}, ${place}` : owner.name;
}

/** What the account page says about each public word. */
export const OWNER_PUBLIC_WORDS = {
  name: 'Shown on results and award certificates of the shows you enter.',
  hometown: 'Public if you give it: printed beside your name on results.',
  club: 'Public if you give it: printed beside your name on results.',
} as const;
