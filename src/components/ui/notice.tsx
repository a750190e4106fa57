import type { ReactNode } from 'react';

type Tone = 'info' | 'ok' | 'warn' | 'bad';

const TONES: Record<Tone, { box: string; word: string }> = {
  info: { box: 'border-ink-soft bg-card', word: 'Note' },
  ok: { box: 'border-ok bg-ok-soft', word: 'Done' },
  warn: { box: 'border-warn bg-warn-soft', word: 'Caution' },
  bad: { box: 'border-bad bg-bad-soft', word: 'Problem' },
};

/** A boxed message; the tone is said in words too, never by colour alone. */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children: ReactNode }) {
  const t = TONES[tone];
  return (
    <div role={tone === 'bad' ? 'alert' : 'status'} className={`rounded-lg border-l-4 px-4 py-3 ${t.box}`}>
      <p className="font-semibold">{title ?? t.word}</p>
      <div className="mt-1 text-sm leading-relaxed">{children}</div>
    </div>
  );
}
