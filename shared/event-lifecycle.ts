import type { EventStatus } from './constants';

/**
 * The steps of a show, each an explicit action an organiser takes: where it starts, where it
 * leads, and what it does in words the confirmation shows before it happens.
 */
export const EVENT_ACTIONS = {
  open_registration: {
    from: ['draft'],
    to: 'registration_open',
    label: 'Open entries',
    explains: 'Owners can find the show and enter their builds until entries close. The show page goes public.',
  },
  close_registration: {
    from: ['registration_open'],
    to: 'registration_closed',
    label: 'Close entries',
    explains: 'No new entries are taken. Entries already made keep their numbers; the waiting list stays as it is.',
  },
  reopen_registration: {
    from: ['registration_closed'],
    to: 'registration_open',
    label: 'Reopen entries',
    explains: 'Owners can enter again, within the registration dates.',
  },
  open_gate: {
    from: ['registration_closed'],
    to: 'show_day',
    label: 'Start show day',
    explains: 'Check-in begins: gate staff can check cars in. Entries stay closed.',
  },
  start_judging: {
    from: ['show_day'],
    to: 'judging',
    label: 'Start judging',
    explains: 'Judges can score. The judging sheet is fixed from now on and can no longer be edited.',
  },
  publish_results: {
    from: ['judging'],
    to: 'results_published',
    label: 'Publish results',
    explains: 'Judging is locked and the results go on the public show page. The show counts as over.',
  },
  archive: {
    from: ['results_published'],
    to: 'archived',
    label: 'Archive the show',
    explains: 'The show is kept for the record and no longer listed as current. Nothing can change after this.',
  },
} as const satisfies Record<string, { from: readonly EventStatus[]; to: EventStatus; label: string; explains: string }>;

export type EventAction = keyof typeof EVENT_ACTIONS;
export const EVENT_ACTION_NAMES = Object.keys(EVENT_ACTIONS) as EventAction[];

/** The actions that can be taken from a status, in the order a screen offers them. */
export const actionsFrom = (status: EventStatus): EventAction[] =>
  EVENT_ACTION_NAMES.filter((a) => (EVENT_ACTIONS[a].from as readonly EventStatus[]).includes(status));

/** Settings, classes and the judging sheet can change until judging starts. */
export const sheetEditable = (status: EventStatus) => ['draft', 'registration_open', 'registration_closed', 'show_day'].includes(status);
export const settingsEditable = (status: EventStatus) => status !== 'archived';
