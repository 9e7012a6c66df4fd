/** Reading a chosen file in the browser, with the same size limit as the server. */
import { UPLOAD_LIMIT_BYTES } from '@shared/export/requests';

/** The text of a file, or an error in words when it is too large or not text. */
export async function readTextFile(file: File): Promise<{ text: string } | { error: string }> {
  if (file.size > UPLOAD_LIMIT_BYTES) return { error: `${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${UPLOAD_LIMIT_BYTES / 1024 / 1024} MB.` };
  const text = await file.text();
  if (text.includes('\u0000')) return { error: `${file.name} is not a text file.` };
  return { text };
}

/** Server issues (ApiError details) as list items. */
export function serverIssues(details: unknown): { where: string; message: string }[] {
  const issues = (details as { issues?: { path: string; message: string }[] } | undefined)?.issues ?? [];
  return issues.map((i) => ({ where: i.path, message: i.message }));
}
