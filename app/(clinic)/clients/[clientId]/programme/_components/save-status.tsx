import { Notice } from "@/components/ui/notice";
import type { SaveState } from "./use-draft-autosave";

const time = new Intl.DateTimeFormat("en-GB", { hour: "2-digit", minute: "2-digit" });

export function SaveStatus({ state }: { state: SaveState }) {
  if (state.kind === "conflict") {
    return (
      <Notice tone="blocks" word="Not saved: edited elsewhere" role="alert">
        {state.message}
      </Notice>
    );
  }
  if (state.kind === "error") {
    return (
      <Notice tone="warning" word="Not saved" role="alert">
        {state.message} Your changes are still here; saving will be tried again when you make another change.
      </Notice>
    );
  }
  const words =
    state.kind === "saving" ? "Saving the draft…" : state.kind === "pending" ? "Unsaved changes" : state.at ? `Draft saved at ${time.format(state.at)}` : "No changes yet";
  return (
    <p role="status" aria-live="polite" className="text-sm text-ink-soft">
      {words}
    </p>
  );
}
