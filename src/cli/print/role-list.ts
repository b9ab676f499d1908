import type { RoleListing } from '../commands/roles.js';

export function printRoleList(roles: readonly RoleListing[]): string {
  return roles
    .map((r) =>
      [
        `${r.id} — ${r.title}`,
        `  ${r.summary}`,
        ...r.inputs.map((i) => {
          const what = i.choices ? `one of ${i.choices.join(' | ')}` : (i.quantity ?? 'text');
          const dflt = i.default !== undefined ? `, default ${i.default}` : i.isRequired ? ', required' : ', optional';
          return `    ${i.name.padEnd(22)} ${i.label} (${what}${dflt}): ${i.help}`;
        }),
      ].join('\n'),
    )
    .join('\n\n');
}
