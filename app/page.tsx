import Link from "next/link";
import { Wordmark } from "@/components/brand";
import { buttonClasses } from "@/components/ui/button";

export default function LandingPage() {
  return (
    <div className="mx-auto flex min-h-dvh max-w-5xl flex-col px-5">
      <header className="flex items-center justify-between py-6">
        <Wordmark />
        <Link href="/sign-in" className={buttonClasses("secondary")}>
          Sign in
        </Link>
      </header>
      <main id="main" className="flex-1 py-10">
        <h1 className="max-w-3xl text-4xl sm:text-5xl">Home stimulation programmes, followed up properly.</h1>
        <p className="mt-6 max-w-2xl text-lg text-ink-soft">
          Rampline is the clinic&apos;s portal for neuromuscular electrical stimulation at home. Therapists screen the
          client, write the programme (electrodes, placement, settings and cautions) and follow it remotely. Clients and
          their carers log each session, comfort and skin checks with photos, and see exactly what changed when the
          therapist adjusts a setting. Every change is recorded.
        </p>
        <div className="mt-8 flex flex-wrap gap-3">
          <Link href="/sign-in" className={buttonClasses("primary", true)}>
            Sign in
          </Link>
          <Link href="/explore" className={buttonClasses("secondary", true)}>
            Try the settings explorer
          </Link>
        </div>
        <ul className="mt-14 grid gap-6 sm:grid-cols-3">
          <li className="rounded-lg border border-line bg-card p-5">
            <h2 className="text-lg">For therapists</h2>
            <p className="mt-2 text-ink-soft">Screening, programme builder with live checks, versions with reasons, a review queue.</p>
          </li>
          <li className="rounded-lg border border-line bg-card p-5">
            <h2 className="text-lg">For clients and carers</h2>
            <p className="mt-2 text-ink-soft">Today&apos;s sessions, a guided session timer, a simple log with photos, messages.</p>
          </li>
          <li className="rounded-lg border border-line bg-card p-5">
            <h2 className="text-lg">For the clinic</h2>
            <p className="mt-2 text-ink-soft">Invitations, roles, an audit trail of every change, exports.</p>
          </li>
        </ul>
        <p className="mt-12 max-w-3xl text-sm text-ink-soft">
          Rampline is not a medical device and makes no clinical decisions. Stimulation settings are always set by the
          treating clinician, following the device manufacturer&apos;s instructions, local regulations and licensed
          practice.
        </p>
      </main>
      <footer className="py-6 text-sm text-ink-soft">Rampline · invitation only · no public sign-up</footer>
    </div>
  );
}
