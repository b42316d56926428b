import type { Action, Actor } from '@/lib/auth';
import { NAV_ITEMS } from './nav-items';

/** The navigation links an actor may see; `allows` is `can` with the server's facts filled in. */
export function visibleNav(actor: Actor, allows: (actor: Actor, action: Action) => boolean) {
  return NAV_ITEMS.filter((item) => item.anyOf.length === 0 || item.anyOf.some((action) => allows(actor, action))).map(
    ({ href, label }) => ({ href, label }),
  );
}
