/**
 * Payload schemas for every IPC call, checked in main before a handler runs. They only bound what
 * crosses the boundary (types, sizes, characters); the design content itself is validated by the
 * renderer with the engine's schema before it is ever sent.
 */
import { z } from 'zod';
import type { InvokeMethod, SendMethod } from './channels.ts';

/** Largest text accepted from the renderer (design JSON, export, recovery snapshot). */
export const MAX_TEXT_CHARS = 20_000_000;
const MAX_PATH_CHARS = 4096;

const filePath = z
  .string()
  .min(1)
  .max(MAX_PATH_CHARS)
  .refine((value) => !value.includes('\0'), 'must not contain a NUL character');

/** A bare file name: no folders, no control characters, not "." or "..". */
const fileName = z
  .string()
  .min(1)
  .max(255)
  .refine((value) => !/[\\/]/.test(value) && ![...value].some((char) => char.charCodeAt(0) < 0x20) && value !== '.' && value !== '..', 'must be a file name without folders or control characters');

const text = z.string().max(MAX_TEXT_CHARS);

export const saveRequestSchema = z.strictObject({ path: filePath.nullable(), suggestedName: fileName, text });

export const exportRequestSchema = z
  .strictObject({
    suggestedName: fileName,
    content: text,
    encoding: z.enum(['utf8', 'base64']),
    filterName: z.string().min(1).max(100),
    extensions: z.array(z.string().regex(/^[a-z0-9]{1,10}$/i, 'must be letters and digits only')).min(1).max(10),
  })
  .refine((request) => request.encoding !== 'base64' || /^[A-Za-z0-9+/]*={0,2}$/.test(request.content), {
    message: 'must be base64 text',
    path: ['content'],
  });

export const pdfRequestSchema = z.strictObject({ suggestedName: fileName, pageSize: z.enum(['A4', 'Letter']) });

export const documentStateSchema = z.strictObject({ name: z.string().max(255), dirty: z.boolean() });

/** Argument lists, one schema per method, so extra or missing arguments are refused too. */
export const INVOKE_PAYLOADS = {
  openDesign: z.tuple([]),
  openRecent: z.tuple([filePath]),
  listRecent: z.tuple([]),
  saveDesign: z.tuple([saveRequestSchema]),
  openLibrary: z.tuple([]),
  openRecentLibrary: z.tuple([filePath]),
  listRecentLibraries: z.tuple([]),
  saveLibrary: z.tuple([saveRequestSchema]),
  openSpreadsheet: z.tuple([]),
  exportFile: z.tuple([exportRequestSchema]),
  printToPdf: z.tuple([pdfRequestSchema]),
  writeRecovery: z.tuple([text]),
  readRecovery: z.tuple([]),
  clearRecovery: z.tuple([]),
} as const satisfies Record<InvokeMethod, z.ZodType<unknown[]>>;

export const SEND_PAYLOADS = {
  setDocumentState: z.tuple([documentStateSchema]),
} as const satisfies Record<SendMethod, z.ZodType<unknown[]>>;

/** One sentence per problem, naming the argument path, for the error the renderer receives. */
export function describePayloadError(method: string, error: z.ZodError): string {
  const problems = error.issues.map((issue) => {
    const where = issue.path.length > 0 ? `argument ${issue.path.join('.')}` : 'arguments';
    return `${where}: ${issue.message}`;
  });
  return `Refused ${method}: ${problems.join('; ')}.`;
}
