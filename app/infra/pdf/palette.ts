// The PDF's colours: the portal's design tokens (app/app.css), written out for pdfkit. Data
// (maps, colour scales) never uses these: it uses viridis from d3-scale-chromatic.
export const pdfColours = {
  ink: "#171b22",
  graphite: "#59564c",
  quiet: "#6b675c",
  rule: "#d9d5c9",
  ruleStrong: "#8c877a",
  paperDeep: "#e9e6dc",
  flag: "#b01e64",
  markLobe: "#e8579a",
  paper: "#f3f1ea",
  caution: "#744600",
  cautionTint: "#fbf0da",
  cautionHatch: "#c98a00",
  danger: "#a4161a",
} as const;
