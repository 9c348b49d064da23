import type { UseFormRegister } from "react-hook-form";
import { FieldError } from "@/components/ui/text-field";
import type { CheckInInput } from "@/lib/check-ins/schema";

const NUMBERS = Array.from({ length: 11 }, (_, n) => n);

// 0 to 10 as eleven large buttons in a row that wraps, with the ends named in words.
export function ComfortScale({ register, error }: { register: UseFormRegister<CheckInInput>; error?: string }) {
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? "comfort-error" : "comfort-ends"}>
      <legend className="mb-1 text-xl font-bold">How comfortable was it?</legend>
      <p id="comfort-ends" className="text-sm text-ink-soft">
        0 is very uncomfortable, 10 is completely comfortable.
      </p>
      <div className="flex flex-wrap gap-2">
        {NUMBERS.map((n) => (
          <label key={n} className="relative">
            <input type="radio" value={n} className="peer sr-only" {...register("comfort", { setValueAs: (v) => (v === "" || v === null ? undefined : Number(v)) })} />
            <span className="flex size-12 cursor-pointer items-center justify-center rounded-md border-2 border-ink bg-card text-lg font-bold tabular-nums peer-checked:bg-ink peer-checked:text-white peer-focus-visible:outline peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-focus">
              {n}
              <span className="sr-only">{n === 0 ? " (very uncomfortable)" : n === 10 ? " (completely comfortable)" : ""}</span>
            </span>
          </label>
        ))}
      </div>
      {error ? <FieldError id="comfort-error" message={error} /> : null}
    </fieldset>
  );
}
