// The two boundary solids' colours: two points of the viridis scale far apart, so they read in
// colour, for colour-blind readers and in greyscale (dark occupational core, light general shell).
import { interpolateViridis } from "d3-scale-chromatic";

export const solidColours = () => ({ general: interpolateViridis(0.9), occupational: interpolateViridis(0.25) });
