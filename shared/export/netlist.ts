/**
 * The compact model as a SPICE netlist (physics.md §2, §3). Per node n: a current source IP_n pushes
 * the scenario's power into t_n, whose voltage is the temperature in °C; the 0 V source VP_n senses
 * that power; the self term (a resistor R_nn, or series R‖C Foster stages) carries it to a_n; the
 * E source EC_n adds the coupling rise, the voltage of summing node c_n (1 Ω to ground) into which
 * F sources inject R_nj·P_j (steady) or G sources R_njk·V(m_j_k) (Foster: m_j_k is P_j through a
 * unit first-order lag of time constant τ_k); V0_n sets the fluid offset. DC: T = offset + R·P.
 */
import type { CompactModel } from './compactModel';
import { asciiText, commentBlock, spiceNumber as num, spiceStems } from './spiceNames';
import { EXPORT_CAUTION, sourceLine, type ExportSource } from './units';

/** Options of writeNetlist. */
export interface NetlistOptions {
  source: ExportSource;
  exportedAt?: Date;
}

function header(m: CompactModel, o: NetlistOptions, stems: string[]): string[] {
  const f = m.foster;
  const lines = [
    `* Heatloom compact thermal model: ${asciiText(sourceLine(o.source))}`,
    `* Exported ${(o.exportedAt ?? new Date()).toISOString()} by Heatloom; sources hold scenario "${asciiText(m.scenario.name)}" (${asciiText(m.scenario.id)}).`,
    '* UNITS: node voltage = temperature in degC (1 V = 1 degC, absolute: the V0_ sources hold the fluid offsets);',
    '*   current = heat flow in W (1 A = 1 W); resistance = K/W (1 ohm = 1 K/W); capacitance = J/K (1 F = 1 J/K).',
    f
      ? `* MODEL: Foster network on ${f.tau.length} time constants, ${num(f.tau[0])} s ... ${num(f.tau[f.tau.length - 1])} s; self terms are series R||C stages, coupling via G sources.`
      : '* MODEL: steady influence matrix (no transient fit exists for this variant): DC / operating point only.',
    '* USE: node t_<name> is the temperature of a part junction or DRAM tier; IP_<name> is its power - change the value',
    '*   (or use a PWL source) for other loads. Any current injected into t_<name> counts as power of that node.',
    ...(m.notes ?? []).flatMap((note) => commentBlock(`NOTE: ${note}`, 96)),
    '* CAUTION:',
    ...commentBlock(EXPORT_CAUTION, 96, '*   '),
    '*',
    '* node                  part (tier)                              limit degC   this scenario degC',
  ];
  m.nodes.forEach((n, i) => {
    const who = asciiText(`${n.partId} (${n.partName})${n.tier ? ` tier ${n.tier}` : ''}`);
    lines.push(`* ${`t_${stems[i]}`.padEnd(21)} ${who.padEnd(40)} ${num(n.limit).padEnd(12)} ${m.temperatures[i].toFixed(3)}`);
  });
  return lines;
}

/**
 * Self stages below this fraction of their sum are merged into the others (rescaled so the sum, hence
 * DC, is unchanged): a tiny stage changes the response by < 1e-6 but makes the circuit ill-conditioned.
 */
export const NEGLIGIBLE_STAGE = 1e-6;

function selfTerm(m: CompactModel, i: number, s: string, from: string, to: string): string[] {
  const f = m.foster;
  if (!f) return [`RS_${s} ${from} ${to} ${num(m.R[i][i])}`];
  const positive = f.R[i][i].map((r, k) => ({ r, k })).filter((t) => t.r > 0);
  const total = positive.reduce((a, t) => a + t.r, 0);
  const kept = positive.filter((t) => t.r > NEGLIGIBLE_STAGE * total);
  const keptSum = kept.reduce((a, t) => a + t.r, 0);
  const stages = kept.map((t) => ({ k: t.k, r: (t.r * total) / keptSum }));
  if (!stages.length) return [`RS_${s} ${from} ${to} 0`];
  return stages.flatMap(({ r, k }, q) => {
    const a = q === 0 ? from : `f_${s}_${q}`;
    const b = q === stages.length - 1 ? to : `f_${s}_${q + 1}`;
    return [`RS_${s}_${k} ${a} ${b} ${num(r)}`, `CS_${s}_${k} ${a} ${b} ${num(f.tau[k] / r)}`];
  });
}

function couplingTerms(m: CompactModel, i: number, stems: string[]): string[] {
  const s = stems[i];
  const out: string[] = [];
  m.nodes.forEach((_, j) => {
    if (!m.foster) {
      if (j !== i && m.R[i][j] !== 0) out.push(`FC_${s}_${stems[j]} 0 c_${s} VP_${stems[j]} ${num(m.R[i][j])}`);
      return;
    }
    m.foster.R[i][j].forEach((r, k) => {
      if (r !== 0 && (j !== i || r < 0)) out.push(`GC_${s}_${stems[j]}_${k} 0 c_${s} m_${stems[j]}_${k} 0 ${num(r)}`);
    });
  });
  return out;
}

function modeStages(m: CompactModel, stems: string[]): string[] {
  if (!m.foster) return [];
  const out = ['*', '* Unit lags: V(m_<name>_<k>) = power of <name> through 1 - exp(-t/tau_k) (1 ohm, tau_k farad).'];
  stems.forEach((s) =>
    m.foster!.tau.forEach((tau, k) => out.push(`FM_${s}_${k} 0 m_${s}_${k} VP_${s} 1`, `RM_${s}_${k} m_${s}_${k} 0 1`, `CM_${s}_${k} m_${s}_${k} 0 ${num(tau)}`)),
  );
  return out;
}

/** The netlist text (CRLF-free, ends with .end). */
export function writeNetlist(m: CompactModel, options: NetlistOptions): string {
  const stems = spiceStems(m.nodes.map((n) => n.label));
  const lines = header(m, options, stems);
  const coupled = m.nodes.length > 1;
  m.nodes.forEach((n, i) => {
    const s = stems[i];
    const coupling = coupled ? couplingTerms(m, i, stems) : [];
    const end = coupling.length ? `a_${s}` : `b_${s}`;
    lines.push('*', `* ${asciiText(n.label)}: T = V(t_${s}), P = I(VP_${s})`);
    lines.push(`IP_${s} 0 t_${s} DC ${num(m.powers[i])}`, `VP_${s} t_${s} s_${s} DC 0`, ...selfTerm(m, i, s, `s_${s}`, end));
    if (coupling.length) lines.push(`EC_${s} a_${s} b_${s} c_${s} 0 1`, `RC_${s} c_${s} 0 1`, ...coupling);
    lines.push(`V0_${s} b_${s} 0 DC ${num(m.offsets[i])}`);
  });
  const usesModes = coupled && m.foster;
  if (usesModes) lines.push(...modeStages(m, stems));
  lines.push('*', '.op', '.end', '');
  return lines.join('\n');
}
