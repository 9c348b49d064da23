export function PageLoading({ label = "Loading…" }: { label?: string }) {
  return (
    <div role="status" aria-live="polite" className="flex items-center gap-3 py-12 text-ink-soft">
      <span aria-hidden className="inline-block size-6 animate-spin rounded-full border-4 border-line border-t-ink" />
      <span>{label}</span>
    </div>
  );
}
