import { OwnerCreditSchema } from './owner-credit';
import { z } from 'zod';

/** One car called out: its place (several cars share a shared place), number, title and the owner's public credit. */
export const ReadOutCallSchema = z.object({
  place: z.number(),
  shared: z.boolean(),
  number: z.number(),
  title: z.string(),
  owner: OwnerCreditSchema.nullable(),
});
export type ReadOutCall = z.infer<typeof ReadOutCallSchema>;

export const READ_OUT_KINDS = ['class', 'best-of-show', 'peoples-choice'] as const;
export const ReadOutSectionSchema = z.object({ kind: z.enum(READ_OUT_KINDS), className: z.string().nullable(), calls: z.array(ReadOutCallSchema) });
export type ReadOutSection = z.infer<typeof ReadOutSectionSchema>;

/** What the announcer reads, in order: each class third to first, then best of show, then people's choice. */
export const ReadOutSchema = z.object({ showName: z.string(), sections: z.array(ReadOutSectionSchema) });
export type ReadOut = z.infer<typeof ReadOutSchema>;

/** The heading the announcer reads for a section. */
export function readOutHeading(section: Pick<ReadOutSection, 'kind' | 'className'>): string {
  if (section.kind === 'best-of-show') return 'Best of show';
  if (section.kind === 'peoples-choice') return 'People’s choice';
  return section.className ?? 'Class';
}
