import type { PolicyListing } from '../commands/policies.js';
import { formatQuantity } from '../../units/index.js';

export function printPolicyList(list: readonly PolicyListing[]): string {
  return list
    .map(({ policy, isBuiltIn }) => {
      const f = policy.factors;
      const row = (name: string, value: number, source: string) => `    ${name.padEnd(8)} ${String(Math.round(value * 100)).padStart(3)} %   ${source}`;
      const ceiling = policy.tj.ceilingK !== undefined ? `≤ ${formatQuantity(policy.tj.ceilingK, 'temperature')} and ` : '';
      return [
        `${policy.id} — ${policy.name}${isBuiltIn ? '' : ' (team policy)'}`,
        `  ${policy.description}`,
        row('VRRM', f.vrrm.value, f.vrrm.source),
        row('IF(AV)', f.ifAv.value, f.ifAv.source),
        row('IFSM', f.ifsm.value, f.ifsm.source),
        row('PD', f.pd.value, f.pd.source),
        row('PPPM', f.pppm.value, f.pppm.source),
        `    Tj       ${ceiling}≤ Tj max − ${policy.tj.marginBelowMaxK} K   ${policy.tj.source}`,
      ].join('\n');
    })
    .join('\n\n');
}
