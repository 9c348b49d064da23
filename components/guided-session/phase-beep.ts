import type { SessionPhase } from "@/lib/session-timer";

// A short tone at each change of phase, made with Web Audio (no sound files to load). Each phase has its own
// shape of tone, like its sign on screen: rising into the ramp-up, a steady high tone for the hold, falling into
// the ramp-down and a single low tone for the rest, so the phase can be told without looking.
const TONES: Record<SessionPhase, [number, number]> = {
  "ramp-up": [520, 780],
  hold: [780, 780],
  "ramp-down": [780, 520],
  rest: [390, 390],
};

const TONE_S = 0.3;

type AudioContextConstructor = typeof AudioContext;

/** Created from a click (browsers only let a page make sound after the person has interacted with it). */
export function createAudio(): AudioContext | null {
  const Ctor: AudioContextConstructor | undefined =
    window.AudioContext ?? (window as unknown as { webkitAudioContext?: AudioContextConstructor }).webkitAudioContext;
  if (!Ctor) return null;
  try {
    return new Ctor();
  } catch {
    return null;
  }
}

export function playPhaseTone(audio: AudioContext, phase: SessionPhase) {
  if (audio.state === "suspended") void audio.resume();
  const [from, to] = TONES[phase];
  const start = audio.currentTime + 0.01;
  const oscillator = audio.createOscillator();
  const gain = audio.createGain();
  oscillator.type = "sine";
  oscillator.frequency.setValueAtTime(from, start);
  oscillator.frequency.linearRampToValueAtTime(to, start + TONE_S);
  // A soft start and end: a tone switched on and off abruptly clicks.
  gain.gain.setValueAtTime(0, start);
  gain.gain.linearRampToValueAtTime(0.25, start + 0.03);
  gain.gain.setValueAtTime(0.25, start + TONE_S - 0.06);
  gain.gain.linearRampToValueAtTime(0, start + TONE_S);
  oscillator.connect(gain).connect(audio.destination);
  oscillator.start(start);
  oscillator.stop(start + TONE_S + 0.02);
}
