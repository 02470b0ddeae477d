/**
 * Electron wraps an error thrown by an IPC handler as
 * "Error invoking remote method '<channel>': Error: <message>". The preload strips that wrapping so the
 * renderer shows main's own sentence.
 */
const WRAPPER = /^Error invoking remote method '[^']*': (?:[A-Za-z]*Error: )?/;

export function cleanInvokeError(error: unknown): Error {
  const message = error instanceof Error ? error.message : String(error);
  return new Error(message.replace(WRAPPER, ''));
}
