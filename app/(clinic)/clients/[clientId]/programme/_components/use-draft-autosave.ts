"use client";
import { useCallback, useEffect, useRef, useState } from "react";
import { ApiError, sendJson } from "@/lib/api-client";
import type { ProgrammeFormValues } from "@/lib/programmes/form-values";

export type SaveState =
  | { kind: "saved"; at: Date | null }
  | { kind: "pending" }
  | { kind: "saving" }
  | { kind: "error"; message: string }
  | { kind: "conflict"; message: string };

const AUTOSAVE_DELAY_MS = 1500;

// Saves the draft a moment after the therapist stops typing, stating the revision it started from. A conflict stops
// autosaving and leaves the therapist's changes on screen; nothing is ever overwritten silently.
export function useDraftAutosave(clientId: string, values: ProgrammeFormValues, initialRevision: number, initialJson: string) {
  const [state, setState] = useState<SaveState>({ kind: "saved", at: null });
  const revision = useRef(initialRevision);
  const [savedJson, setSavedJson] = useState(initialJson);
  const json = JSON.stringify(values);
  const dirty = json !== savedJson;

  const save = useCallback(async (): Promise<boolean> => {
    const body = JSON.stringify(values);
    if (body === savedJson) return true;
    setState({ kind: "saving" });
    try {
      const result = await sendJson<{ revision: number; savedAt: string }>("PUT", `/api/clients/${encodeURIComponent(clientId)}/programme/draft`, {
        values,
        baseRevision: revision.current,
      });
      revision.current = result.revision;
      setSavedJson(body);
      setState({ kind: "saved", at: new Date(result.savedAt) });
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) setState({ kind: "conflict", message: error.message });
      else setState({ kind: "error", message: error instanceof Error ? error.message : "The draft was not saved." });
      return false;
    }
  }, [clientId, values, savedJson]);

  useEffect(() => {
    if (!dirty || state.kind === "conflict" || state.kind === "saving") return;
    const timer = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [json, dirty, save, state.kind]);

  // Leaving with unsaved changes asks first.
  useEffect(() => {
    if (!dirty) return;
    const warn = (event: BeforeUnloadEvent) => {
      event.preventDefault();
      event.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  return { state: dirty && state.kind === "saved" ? ({ kind: "pending" } as SaveState) : state, save, revision, dirty };
}
