/** CSV of an assembly result: one row per part (and per memory tier), then the influence matrix. */
import type { AssemblyResult } from './result';

const num = (v: number, digits = 4): string => (Number.isFinite(v) ? String(Number(v.toPrecision(digits + 2))) : '');
const text = (s: string): string => (/[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s);

/** Per-part temperatures (°C), powers (W), heat split (W), R_ii (K/W) and the part influence matrix (K/W). */
export function assemblyCsv(result: AssemblyResult): string {
  const lines = ['part,tier,name,kind,power_W,mean_C,peak_C,heat_up_W,heat_down_W,self_resistance_K_per_W,coupling_share,limit_C,margin_K'];
  for (const p of result.parts) {
    lines.push([p.id, 0, text(p.name), p.kind, num(p.power), num(p.junction), num(p.peak), num(p.heatUp), num(p.heatDown), num(p.selfResistance), num(p.couplingShare), num(p.limit), num(p.margin)].join(','));
    for (const t of p.tiers) lines.push([p.id, t.tier, text(`${p.name} tier ${t.tier}`), 'tier', num(t.power), num(t.temperature), '', '', '', '', '', num(p.limit), num(p.limit - t.temperature)].join(','));
  }
  lines.push('');
  lines.push(['influence_K_per_W', ...result.influence.partIds].join(','));
  result.influence.matrix.forEach((row, j) => lines.push([result.influence.partIds[j], ...row.map((v) => num(v, 6))].join(',')));
  return lines.join('\n');
}
