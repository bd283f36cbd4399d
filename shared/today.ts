// The organiser's "Today" dashboard: what to do next, from where the show is and what the day shows.

export type TodayFigures = { status: string; arrived: number; expected: number; unpaid: number; sheets: { done: number; all: number } | null };

/** The one next thing to do, in the organiser's words. */
export function todayNextStep(f: TodayFigures): string {
  if (f.status === 'show_day') {
    if (f.unpaid) return `Settle the ${f.unpaid === 1 ? 'unpaid entry' : `${f.unpaid} unpaid entries`} at the gate, then start judging once the cars are in.`;
    if (f.arrived < f.expected) return `${f.expected - f.arrived} of ${f.expected} cars still to arrive. Start judging when the field is in; late arrivals still join the judges’ lists.`;
    return 'Every car is in: start judging.';
  }
  if (f.status === 'judging') {
    if (!f.sheets || f.sheets.all === 0) return 'No judge has cars to score yet: give each judge their classes.';
    const left = f.sheets.all - f.sheets.done;
    if (left) return `${left} ${left === 1 ? 'sheet' : 'sheets'} still to finish. Late arrivals checked in at the gate join the judges’ lists.`;
    return 'Every sheet is finished: review the results and publish them.';
  }
  return '';
}

/** The words of the dashboard's figures. */
export const arrivalsWords = (arrived: number, expected: number) => `${arrived} of ${expected} cars checked in`;
export const unpaidWords = (unpaid: number) => (unpaid ? `${unpaid} unpaid ${unpaid === 1 ? 'entry' : 'entries'}` : 'No unpaid entries');
export const sheetsWords = (finished: number, all: number) => `${finished} of ${all} judges’ sheets finished`;
