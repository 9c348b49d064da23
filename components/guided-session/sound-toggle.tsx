// The sound cue's switch: a large checkbox row with a label that says what it does and where the sound comes from.
export function SoundToggle({ on, onChange }: { on: boolean; onChange: (on: boolean) => void }) {
  return (
    <div className="rounded-lg border-2 border-line bg-card has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-focus">
      <label htmlFor="session-sound" className="flex min-h-16 cursor-pointer items-start gap-4 p-4">
        <input
          id="session-sound"
          type="checkbox"
          checked={on}
          onChange={(event) => onChange(event.target.checked)}
          aria-describedby="session-sound-hint"
          className="mt-0.5 size-8 shrink-0 cursor-pointer accent-ink focus-visible:outline-none"
        />
        <span>
          <span className="block font-bold">Sound at each change of phase</span>
          <span id="session-sound-hint" className="block text-base text-ink-soft">
            Off unless you turn it on. A rising tone for ramp up, a steady one for hold, a falling one for ramp down and
            a low one for rest. The sound comes from this phone or computer, not from the stimulator.
          </span>
        </span>
      </label>
    </div>
  );
}
