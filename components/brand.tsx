import Link from "next/link";

// Rampline's mark: a small ramp-hold-ramp envelope, the same shape as the cycle ribbon drawn for every programme.
export function RamplineMark({ className = "h-7 w-11" }: { className?: string }) {
  return (
    <svg viewBox="0 0 44 28" className={className} aria-hidden focusable="false">
      <path d="M2 24 L12 6 L30 6 L40 24 Z" fill="#1e5673" />
      <path d="M2 24 H42" stroke="#1b2633" strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}

export function Wordmark({ href = "/" }: { href?: string }) {
  return (
    <Link href={href} className="inline-flex items-center gap-2 text-xl font-bold no-underline">
      <RamplineMark />
      <span>Rampline</span>
    </Link>
  );
}
