import type { Provenance } from '@shared/calc';

/** Provenance in words, not colour alone: measured figures plain, "est." and "target" marked. */
export function ProvenanceMark({ provenance }: { provenance: Provenance | undefined }) {
  if (provenance === 'estimated') return <span className="ml-1 text-xs font-normal uppercase tracking-wide text-graphite">est.</span>;
  if (provenance === 'target') return <span className="ml-1 text-xs font-normal uppercase tracking-wide text-caution">target</span>;
  return null;
}
