import { z } from 'zod';
import { CLASSES_PER_EVENT_MAX, EVENT_CAPACITY_MAX, CRITERIA_PER_EVENT_MAX, CRITERION_MAX_POINTS_MAX } from '../constants';
import { optionalText, requiredLine } from './text';


// A show's classes and its judging sheet (the criteria every car is scored on).

/** A show's or a class's number of places; empty for no limit. */
export const CapacitySchema = z
  .number({ error: 'Capacity must be a whole number or empty.' })
  .int({ error: 'Capacity must be a whole number.' })
  .min(1, { error: 'Capacity must be at least 1, or empty for no limit.' })
  .max(EVENT_CAPACITY_MAX, { error: `Capacity must be at most ${EVENT_CAPACITY_MAX}.` })
  .nullable();

export const ClassInputSchema = z.object({
  name: requiredLine('Class name', 80),
  description: optionalText('Description', 1000).default(''),
  position: z.number().int().min(0).max(CLASSES_PER_EVENT_MAX).optional(),
  capacity: CapacitySchema.default(null),
});
export type ClassInput = z.infer<typeof ClassInputSchema>;
export const ClassUpdateSchema = z.object({
  name: ClassInputSchema.shape.name,
  description: optionalText('Description', 1000),
  position: z.number().int().min(0).max(CLASSES_PER_EVENT_MAX),
  capacity: CapacitySchema,
}).partial();
export type ClassUpdateInput = z.infer<typeof ClassUpdateSchema>;

export const CriterionInputSchema = z.object({
  name: requiredLine('Criterion', 80),
  maxPoints: z.number({ error: 'Max points must be a whole number.' }).int({ error: 'Max points must be a whole number.' }).min(1, { error: 'At least 1 point.' }).max(CRITERION_MAX_POINTS_MAX),
  weight: z.number({ error: 'Weight must be a number.' }).gt(0, { error: 'Weight must be above 0.' }).max(100, { error: 'Weight must be at most 100.' }),
  tieBreakOrder: z.number().int().min(1).max(CRITERIA_PER_EVENT_MAX).nullable().default(null),
});
export type CriterionInput = z.infer<typeof CriterionInputSchema>;

/** The whole judging sheet at once, in the order it is scored; tie-break places are unique. */
export const JudgingSheetSchema = z
  .object({ criteria: z.array(CriterionInputSchema).max(CRITERIA_PER_EVENT_MAX, { error: `At most ${CRITERIA_PER_EVENT_MAX} criteria.` }) })
  .superRefine((v, ctx) => {
    const seen = new Map<number, number>();
    v.criteria.forEach((c, i) => {
      if (c.tieBreakOrder == null) return;
      if (seen.has(c.tieBreakOrder)) ctx.addIssue({ code: 'custom', path: ['criteria', i, 'tieBreakOrder'], message: 'Two criteria cannot share a tie-break place.' });
      seen.set(c.tieBreakOrder, i);
    });
    const names = new Set<string>();
    v.criteria.forEach((c, i) => {
      const key = c.name.toLowerCase();
      if (names.has(key)) ctx.addIssue({ code: 'custom', path: ['criteria', i, 'name'], message: 'Each criterion needs its own name.' });
      names.add(key);
    });
  });
export type JudgingSheetInput = z.infer<typeof JudgingSheetSchema>;

// ---- Responses ----
export const EventClassSchema = z.object({ id: z.number(), name: z.string(), description: z.string(), position: z.number(), capacity: z.number().nullable() });
export type EventClass = z.infer<typeof EventClassSchema>;
export const CriterionSchema = z.object({ id: z.number(), name: z.string(), maxPoints: z.number(), weight: z.number(), tieBreakOrder: z.number().nullable(), position: z.number() });
export type Criterion = z.infer<typeof CriterionSchema>;
