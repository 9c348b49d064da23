"use client";

import { useCallback, useEffect, useRef, useState } from "react";
import type { SessionPhase } from "@/lib/session-timer";
import { createAudio, playPhaseTone } from "./phase-beep";

/**
 * The optional sound cue: off until the person turns it on (the toggle's click is also what lets the browser make
 * sound). A tone plays when `phaseKey` changes while the timer runs, not on the first phase after a reload.
 */
export function usePhaseSound(phaseKey: string | null, phase: SessionPhase | null) {
  const [on, setOn] = useState(false);
  const audio = useRef<AudioContext | null>(null);
  const lastKey = useRef<string | null>(null);

  const toggle = useCallback((next: boolean) => {
    if (next && !audio.current) audio.current = createAudio();
    if (next && audio.current?.state === "suspended") void audio.current.resume();
    setOn(next);
  }, []);

  useEffect(() => {
    const previous = lastKey.current;
    lastKey.current = phaseKey;
    if (!on || !audio.current || phaseKey === null || phase === null || previous === null || previous === phaseKey) return;
    playPhaseTone(audio.current, phase);
  }, [on, phaseKey, phase]);

  useEffect(() => () => void audio.current?.close(), []);

  return { soundOn: on, setSoundOn: toggle };
}
