// Figures on the assessment pages: percentages and powers to four significant figures, never in
// exponent notation, with thousands grouped.
const sig4 = new Intl.NumberFormat("en-GB", { maximumSignificantDigits: 4 });
const sig3 = new Intl.NumberFormat("en-GB", { maximumSignificantDigits: 3 });

export const figure = (v: number) => sig4.format(v);
export const figure3 = (v: number) => sig3.format(v);
