/**
 * Colours for the 3D scene. The interface tokens are read from the page's CSS variables when they
 * exist, so the scene follows the theme; the materials' own colours are fixed here.
 */
export function cssColor(variable: string, fallback: string): string {
  if (typeof window === "undefined") return fallback;
  const v = getComputedStyle(document.documentElement).getPropertyValue(variable).trim();
  return v || fallback;
}

export const sceneColours = {
  glass: "#b9d6cf", // the pale green-blue of thick glass
  glassCut: "#8fb8ae",
  wood: "#8b5e3c",
  engraving: "#f5f2ea",
  water: "#4f86b5",
  floor: "#ede5d5",
};
