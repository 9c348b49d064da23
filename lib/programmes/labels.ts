// Plain words for the programme's coded values, shared by the builder, the diff, the handout and the client's view.
export const ELECTRODE_TYPE_IDS = ["standard-gel", "sensitive-skin-gel", "reusable-carbon"] as const;
export type ElectrodeTypeId = (typeof ELECTRODE_TYPE_IDS)[number];

export const ELECTRODE_TYPE_LABELS: Record<ElectrodeTypeId, string> = {
  "standard-gel": "Self-adhesive, standard gel",
  "sensitive-skin-gel": "Self-adhesive, thicker gel for sensitive skin",
  "reusable-carbon": "Carbon rubber with gel or sponge",
};

export const WAVEFORM_LABELS = {
  "symmetric-biphasic": "Symmetric biphasic",
  "asymmetric-balanced-biphasic": "Asymmetric balanced biphasic",
  monophasic: "Monophasic",
} as const;

export const SIDE_LABELS = { left: "Left", right: "Right" } as const;
