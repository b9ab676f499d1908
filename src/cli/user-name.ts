import { userInfo } from 'node:os';

/** Who a change is recorded as: --by when given, else the OS user. */
export function changeAuthor(by: string | undefined): string {
  if (by?.trim()) return by.trim();
  try {
    return userInfo().username || 'unknown';
  } catch {
    return process.env.USER ?? 'unknown';
  }
}
