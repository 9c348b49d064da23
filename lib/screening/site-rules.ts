import type { AnswersDraft, Concern, Rule, SiteDraft } from "./rule-types";
import { SCREENING_SOURCES as S } from "./sources";

// Per electrode site: which answers are concerns, and how strongly. Each rule names its source (lib/screening/sources.ts).
export const SITE_RULES: Rule<SiteDraft>[] = [
  {
    code: "skin-not-intact",
    level: "do-not-place",
    applies: (site) => site.skinIntact === "no",
    title: "Skin not intact",
    detail: "Electrodes do not go over broken or inflamed skin.",
    source: `${S.commonPractice}; ${S.houghtonRecalled}`,
  },
  {
    code: "too-close-to-neck-or-chest",
    level: "do-not-place",
    applies: (site) => site.clearOfNeckAndChest === "no",
    title: "Not clear of the front of the neck or the chest",
    detail: "The current path must not cross the front of the neck or the chest.",
    source: S.iecNeckChest,
  },
  {
    code: "clot-history",
    level: "do-not-place",
    applies: (site) => site.clotHistory === "yes",
    title: "History of a blood clot in this limb",
    detail: "A checklist cannot tell a resolved clot from a current one; contractions over a clot could dislodge it.",
    source: S.houghtonRecalled,
  },
  {
    code: "malignancy-or-radiotherapy",
    level: "do-not-place",
    applies: (site) => site.malignancyOrRadiotherapy === "yes",
    title: "Malignancy or radiotherapy in this region",
    detail: "Electrodes do not go over a known malignancy or over skin treated with radiotherapy.",
    source: S.houghtonRecalled,
  },
  {
    code: "sensation-absent",
    level: "precaution",
    applies: (site) => site.sensationResult === "absent",
    title: "Sensation absent",
    detail: "The client cannot feel a burn starting here: someone checks the skin before and after every session.",
    source: S.houghtonRecalled,
  },
  {
    code: "sensation-reduced",
    level: "precaution",
    applies: (site) => site.sensationResult === "reduced",
    title: "Sensation reduced",
    detail: "The client may not feel discomfort in time: check the skin closely and turn the amplitude up slowly.",
    source: S.houghtonRecalled,
  },
  {
    code: "recent-fracture-or-surgery",
    level: "precaution",
    applies: (site) => site.recentFractureOrSurgery === "yes",
    title: "Recent fracture or surgery",
    detail: "Strong contractions load healing bone and tissue: agree limits with the treating team.",
    source: S.houghtonRecalled,
  },
  {
    code: "swelling",
    level: "precaution",
    applies: (site) => site.swelling === "yes",
    title: "Swelling",
    detail: "Swollen skin is fragile, and new swelling needs its cause ruled out.",
    source: S.commonPractice,
  },
  {
    code: "metalwork",
    level: "note",
    applies: (site) => site.metalwork === "yes",
    title: "Metalwork under or near the site",
    detail: "Recorded for information only.",
    source: S.checklist,
  },
];

export function siteConcerns(answers: AnswersDraft): Concern[] {
  return (answers.sites ?? []).flatMap((site, index) => {
    if (!site) return [];
    const name = site.name?.trim() || `Site ${index + 1}`;
    return SITE_RULES.filter((rule) => rule.applies(site)).map((rule) => ({
      code: rule.code,
      level: rule.level,
      title: rule.title,
      detail: rule.detail,
      source: rule.source,
      site: { index, name },
    }));
  });
}

