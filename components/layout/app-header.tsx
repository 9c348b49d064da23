import Link from "next/link";
import { Wordmark } from "@/components/brand";
import type { Actor } from "@/lib/auth/actor";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { SignOutButton } from "./sign-out-button";

export type NavItem = { href: string; label: string; badge?: string };

export function AppHeader({ actor, nav }: { actor: Actor; nav: NavItem[] }) {
  return (
    <header className="border-b border-line bg-card print:hidden">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-4 px-5 py-3">
        <div className="flex flex-wrap items-center gap-6">
          <Wordmark href="/home" />
          <nav aria-label="Main">
            <ul className="flex flex-wrap gap-1">
              {nav.map((item) => (
                <li key={item.href}>
                  <Link href={item.href} className="inline-flex min-h-11 items-center rounded-md px-3 font-bold no-underline hover:bg-line-soft">
                    {item.label}
                    {item.badge ? <span className="ml-2 rounded-full bg-ink px-2 text-sm text-white">{item.badge}</span> : null}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
        </div>
        <div className="flex items-center gap-3">
          <p className="text-sm leading-tight">
            <span className="block font-bold">{actor.name}</span>
            <span className="block text-ink-soft">
              {ROLE_LABELS[actor.role]} · {actor.clinicName}
            </span>
          </p>
          <Link href="/settings" className="text-sm font-bold">
            E-mail settings
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
