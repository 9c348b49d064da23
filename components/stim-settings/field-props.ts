import type { UseFormRegisterReturn } from "react-hook-form";
import type { ChannelSettingsFormValues } from "@/lib/forms/channel-settings-values";

/**
 * What every group of channel-settings fields receives. `register` takes the field's path inside the settings
 * (e.g. "frequencyHz"); the host form adds its own prefix (the explorer none, the builder "channels.0.settings."),
 * so the same fields serve both. `errors` are the analysis's field messages, keyed by the same inner paths.
 */
export type FieldGroupProps = {
  register: (name: string) => UseFormRegisterReturn;
  errors: Record<string, string>;
  values: ChannelSettingsFormValues;
};

export type { UseFormRegisterReturn };
