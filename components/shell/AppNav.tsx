'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

export interface AppNavLink {
  href: string;
  label: string;
}

function isCurrent(pathname: string, href: string, all: AppNavLink[]): boolean {
  if (pathname !== href && !pathname.startsWith(`${href}/`)) return false;
  // The longest matching link wins, so /desk/new does not also light up Desk.
  return !all.some((other) => other.href.length > href.length && (pathname === other.href || pathname.startsWith(`${other.href}/`)));
}

export function AppNav({ links }: { links: AppNavLink[] }) {
  const pathname = usePathname() ?? '';
  return (
    <nav aria-label="Main" className="flex items-center gap-1">
      {links.map((link) => {
        const current = isCurrent(pathname, link.href, links);
        return (
          <Link
            key={link.href}
            href={link.href}
            aria-current={current ? 'page' : undefined}
            className={`rounded px-2 py-1 text-sm no-underline hover:bg-open/60 ${current ? 'bg-open font-medium' : 'text-ink/80'}`}
          >
            {link.label}
          </Link>
        );
      })}
    </nav>
  );
}
