import type { ScreeningFormValues } from "./schema";

// The shapes the screening rules work on. Rules accept a half-filled form (any answer may be missing or null) so
// the form's summary can run them while the therapist types, and the signed answers, which are a complete form.
type Loose<T> = T extends readonly (infer U)[]
  ? readonly Loose<U>[]
  : T extends object
    ? { readonly [K in keyof T]?: Loose<T[K]> | null }
    : T;
export type AnswersDraft = Loose<ScreeningFormValues>;
export type SiteDraft = NonNullable<NonNullable<AnswersDraft["sites"]>[number]>;

// "do-not-place": electrodes should not go on this site. "precaution": the client may be eligible, with care.
// "note": recorded for the therapist's information; it does not affect the outcome.
export type ConcernLevel = "do-not-place" | "precaution" | "note";

export type ConcernCode =
  | "skin-not-intact"
  | "too-close-to-neck-or-chest"
  | "clot-history"
  | "malignancy-or-radiotherapy"
  | "sensation-absent"
  | "sensation-reduced"
  | "recent-fracture-or-surgery"
  | "swelling"
  | "metalwork"
  | "understanding-limited"
  | "dexterity-limited"
  | "carer-not-yet-competent"
  | "test-not-done"
  | "test-not-tolerated"
  | "test-skin-reaction"
  | "test-no-contraction";

export type Concern = {
  code: ConcernCode;
  level: ConcernLevel;
  title: string;
  detail: string;
  source: string;
  site?: { index: number; name: string };
};

export type Rule<T> = Omit<Concern, "site"> & { applies: (input: T) => boolean };

