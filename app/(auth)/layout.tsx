import type { ReactNode } from 'react';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-sm flex-col justify-center gap-6 px-4 py-12">
      <div>
        <p className="text-lg font-semibold tracking-tight">Zonewright</p>
        <p className="text-xs text-ink/60">Flat diffractive optics, from phase profile to mask</p>
      </div>
      {children}
    </main>
  );
}
