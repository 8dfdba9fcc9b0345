// Id order for tie-breaks: plain code-unit order, the same on every machine and locale.
export const compareIds = (a: string, b: string): number => (a < b ? -1 : a > b ? 1 : 0);
