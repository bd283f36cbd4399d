import type { Provenance } from '@shared/calc';
import { PROVENANCE_MARKS } from '@shared/build-sheet/choice-labels';

/** Provenance in words, not colour alone: measured figures plain, "est." and "target" marked. */
export function ProvenanceMark({ provenance }: { provenance: Provenance | undefined }) {
  if (provenance === 'estimated') return <span className="ml-1 text-xs font-normal uppercase tracking-wide text-graphite">{PROVENANCE_MARKS.estimated}</span>;
  if (provenance === 'target') return <span className="ml-1 text-xs font-normal uppercase tracking-wide text-caution">{PROVENANCE_MARKS.target}</span>;
  return null;
}
