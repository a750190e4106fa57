import type { ReactNode } from 'react';
import { PageHeading } from '@/components/ui/page';

/** The frame of the signed-out screens: the name, one card, the safety line. */
export function AuthLayout({ title, children }: { title: string; children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center gap-6 px-4 py-8">
      <div>
        <p className="font-mono text-sm font-medium tracking-widest text-brass-deep uppercase">Gripline</p>
        <p className="text-steel">The chapter's tool crib and fastener stock</p>
      </div>
      <section className="rounded-xl border border-rule bg-card p-5 shadow-sm">
        <PageHeading title={title} className="mb-4" />
        {children}
      </section>
    </main>
  );
}
