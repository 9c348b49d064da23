import type { UseFormRegister } from "react-hook-form";
import { FieldError } from "@/components/ui/text-field";
import type { CheckInInput } from "@/lib/check-ins/schema";

const NUMBERS = Array.from({ length: 11 }, (_, n) => n);

// 0 to 10 as eleven large choices in a row that wraps, with the ends named in words.
export function ComfortScale({ register, error }: { register: UseFormRegister<CheckInInput>; error?: string }) {
  return (
    <fieldset className="flex flex-col gap-2" aria-describedby={error ? "comfort-error" : "comfort-ends"}>
      <legend className="mb-1 text-xl font-bold">How comfortable was it?</legend>
      <p id="comfort-ends" className="text-sm text-ink-soft">
        0 is very uncomfortable, 10 is completely comfortable.
      </p>
      <div className="flex flex-wrap gap-2">
        {NUMBERS.map((n) => (
          <label key={n} className="flex min-h-12 min-w-16 cursor-pointer items-center gap-2 rounded-md border-2 border-ink bg-card px-3 text-lg font-bold tabular-nums has-[:checked]:bg-ink has-[:checked]:text-white">
            <input type="radio" value={n} className="size-5 accent-white" {...register("comfort")} />
            {n}
            <span className="sr-only">{n === 0 ? " (very uncomfortable)" : n === 10 ? " (completely comfortable)" : ""}</span>
          </label>
        ))}
      </div>
      {error ? <FieldError id="comfort-error" message={error} /> : null}
    </fieldset>
  );
}
