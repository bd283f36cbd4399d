import type { ReactNode } from 'react';

type Tone = 'info' | 'ok' | 'caution' | 'danger';
const tones: Record<Tone, string> = {
  info: 'border-ink',
  ok: 'border-ok',
  caution: 'border-caution',
  danger: 'border-danger',
};

/** A message box with a thick left rule; the words carry the meaning, the colour only helps. */
export function Notice({ tone = 'info', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <div role={tone === 'danger' ? 'alert' : 'status'} className={`border-l-4 bg-white/70 px-4 py-3 ${tones[tone]}`}>
      {children}
    </div>
  );
}
