/** Longest caption a file may carry (the server checks the same limit). */
export const CAPTION_LIMIT = 500;
