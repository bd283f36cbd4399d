import { countOf } from '@shared/words';

/** The line under the search box: every account, or what a search matched ("3 accounts match “sam”."). */
export function accountsSummary(total: number, search: string): string {
  if (!search) return `${countOf(total, 'account')} in all.`;
  if (total === 0) return `No account matches “${search}”.`;
  return `${countOf(total, 'account')} ${total === 1 ? 'matches' : 'match'} “${search}”.`;
}
