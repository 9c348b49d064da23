import { z } from "zod";
import { SETTINGS_LIMITS as L } from "./limits";
import { CM_PER_INCH, toCm } from "./units";

const unit = z.enum(["cm", "in"], { error: "Choose the unit of the electrode size: cm or in." });

function dimension(label: string) {
  return z
    .number({
      error: (issue) =>
        issue.input === undefined ? `Enter the electrode's ${label}.` : `The electrode's ${label} must be a number.`,
    })
    .gt(0, { error: `The electrode's ${label} must be more than 0.` });
}

const maxCm = L.electrodeDimensionCm.max;
const tooBig = `Electrode sizes must be ${maxCm} cm (about ${(maxCm / CM_PER_INCH).toFixed(1)} in) or less.`;

/** Sizes are of the conductive area, not the backing. */
export const electrodeSchema = z
  .discriminatedUnion(
    "shape",
    [
      z.object({ shape: z.literal("round"), diameter: dimension("diameter"), unit }),
      z.object({ shape: z.literal("square"), side: dimension("side"), unit }),
      z.object({ shape: z.literal("rectangle"), width: dimension("width"), length: dimension("length"), unit }),
    ],
    { error: "Choose the electrode's shape: round, square or rectangle." },
  )
  .superRefine((e, ctx) => {
    // The upper bound is in cm whichever unit was typed, so it needs the unit and sits outside the fields.
    const dims: Array<[string, number]> =
      e.shape === "round"
        ? [["diameter", e.diameter]]
        : e.shape === "square"
          ? [["side", e.side]]
          : [["width", e.width], ["length", e.length]];
    for (const [key, value] of dims) {
      if (toCm(value, e.unit) > maxCm) ctx.addIssue({ code: "custom", message: tooBig, path: [key] });
    }
  });

/** A channel's pair; the two may differ in shape and size. */
export const electrodePairSchema = z.tuple([electrodeSchema, electrodeSchema], {
  error: "A channel needs exactly two electrodes.",
});

export type Electrode = z.infer<typeof electrodeSchema>;
