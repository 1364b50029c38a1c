// Figures on the assessment pages: percentages and powers to four significant figures, never in
// exponent notation, with thousands grouped.
const sig4 = new Intl.NumberFormat("en-GB", { maximumSignificantDigits: 4 });
const sig3 = new Intl.NumberFormat("en-GB", { maximumSignificantDigits: 3 });

export const figure = (v: number) => sig4.format(v);
export const figure3 = (v: number) => sig3.format(v);

const oneDecimal = new Intl.NumberFormat("en-GB", { minimumFractionDigits: 1, maximumFractionDigits: 1 });
/** An area in square metres to 0.1 m², thousands grouped: "1,120.0". */
export const areaFigure = (m2: number) => oneDecimal.format(m2);
