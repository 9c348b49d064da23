import type { ButtonHTMLAttributes } from "react";

type Variant = "primary" | "secondary" | "danger" | "quiet";

const styles: Record<Variant, string> = {
  primary: "bg-ink text-white hover:bg-ink-soft border-ink",
  secondary: "bg-card text-ink hover:bg-paper border-ink",
  danger: "bg-blocks text-white hover:brightness-110 border-blocks",
  quiet: "bg-transparent text-ink underline underline-offset-4 border-transparent hover:bg-line-soft",
};

export function buttonClasses(variant: Variant = "primary", large = false) {
  return `inline-flex items-center justify-center gap-2 rounded-md border-2 font-bold transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${
    large ? "min-h-14 px-6 text-lg" : "min-h-11 px-4 text-base"
  } ${styles[variant]}`;
}

export function Button({
  variant = "primary",
  large = false,
  busy = false,
  className = "",
  children,
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; large?: boolean; busy?: boolean }) {
  return (
    <button
      {...props}
      disabled={props.disabled || busy}
      aria-busy={busy || undefined}
      className={`${buttonClasses(variant, large)} ${className}`}
    >
      {busy ? <span aria-hidden className="inline-block size-4 animate-spin rounded-full border-2 border-current border-t-transparent" /> : null}
      {children}
    </button>
  );
}
