import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The frame of the pages one reaches signed out: an invitation, a reset, a forgotten password. */
export function PublicPage({ title, children }: { title: string; children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-xl flex-col justify-center gap-6 px-6 py-10">
      <Link to={paths.signIn} className="font-serif text-3xl font-semibold text-ink no-underline">
        Printwarden
      </Link>
      <section className="rounded-lg border border-paper-edge bg-white/70 p-6 shadow-sm">
        <h1 className="mb-4 text-2xl">{title}</h1>
        {children}
      </section>
    </main>
  );
}
