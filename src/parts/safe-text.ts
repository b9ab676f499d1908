/**
 * Catalog text comes from outside: strip terminal escape sequences and control characters
 * (keeping nothing that could move the cursor, recolour or retitle a terminal).
 */
export function safeText(text: string): string {
  return text
    .replace(/\u001b\][^\u0007\u001b]*(\u0007|\u001b\\)?/g, '') // OSC (titles, links)
    .replace(/\u001b\[[0-?]*[ -/]*[@-~]/g, '') // CSI (colours, cursor)
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, '');
}
