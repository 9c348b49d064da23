import type { UseFormRegister } from "react-hook-form";
import type { ExploreValues } from "./explore-values";

/** What every group of the explorer's fields receives: the form's register and the analysis's field messages. */
export type FieldGroupProps = {
  register: UseFormRegister<ExploreValues>;
  errors: Record<string, string>;
  values: ExploreValues;
};
