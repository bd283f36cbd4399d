import { SECTION_LABELS } from '@shared/schemas/build-sections';

/** The editor's forms, one per panel that saves by itself. */
export type FormKey = 'overview' | 'engine' | 'drivetrain' | 'chassis' | 'brakes' | 'wheels' | 'body' | 'extra' | 'credits' | 'private';

export const FORM_LABELS: Record<FormKey, string> = {
  overview: 'Overview',
  ...SECTION_LABELS,
  credits: 'Credits',
  private: 'Private details',
};
