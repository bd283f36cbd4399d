import { ENGINEERING_CAUTION } from '@shared/calc';
import { ProvenanceMark } from '@client/components/ui/provenance-mark';
import type { NumberGroup } from '../../model/numbers/types';

/** One block of computed figures: a small data table, with its notes in words. */
export function NumberGroupView({ group, showHint = true }: { group: NumberGroup; showHint?: boolean }) {
  if (!group.rows.length && !showHint) return null;
  return (
    <div className="border-t border-rule pt-2 first:border-t-0 first:pt-0" data-numbers-group={group.id}>
      <h3 className="font-display text-sm uppercase tracking-wide text-graphite">{group.title}</h3>
      {group.rows.length ? (
        <table className="mt-1 w-full text-sm">
          <tbody>
            {group.rows.map((row) => (
              <tr key={row.label} className="border-b border-rule/60 align-top last:border-b-0">
                <th scope="row" className="py-1 pr-2 text-left font-normal text-graphite">
                  {row.label}
                </th>
                <td className="py-1 text-right whitespace-nowrap">
                  <span className="font-display text-base">{row.value}</span>
                  <ProvenanceMark provenance={row.provenance ?? (row.estimate ? 'estimated' : undefined)} />
                  {row.other ? <span className="block text-xs text-graphite">{row.other}</span> : null}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : showHint && group.hint ? (
        <p className="mt-1 text-sm text-graphite">{group.hint}</p>
      ) : null}
      {group.rows.length && group.hint ? <p className="mt-1 text-xs text-graphite">{group.hint}</p> : null}
      {group.rows.length ? group.notes?.map((n) => <p key={n} className="mt-1 text-xs text-graphite">{n}</p>) : null}
      {group.caution && group.rows.length ? <p className="mt-1 border-l-4 border-caution pl-2 text-xs text-graphite">{ENGINEERING_CAUTION}</p> : null}
    </div>
  );
}
