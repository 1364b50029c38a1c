// What a site is, in the words the trade uses. Shared by forms, lists and the API.
export const siteKinds = ["rooftop", "tower", "monopole", "street-pole", "water-tank", "other"] as const;
export type SiteKind = (typeof siteKinds)[number];

export const siteKindLabels: Record<SiteKind, string> = {
  rooftop: "Rooftop",
  tower: "Tower",
  monopole: "Monopole",
  "street-pole": "Street pole (small cell)",
  "water-tank": "Water tank",
  other: "Other",
};
