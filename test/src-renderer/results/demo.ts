/** A stand-in role labeller for the results-screen unit tests (shows which label a row asked for). */
export const labelOf = (role: string) => `label:${role}`;
