/** Part template form: display units (mm, µm, °C) ↔ the template body in SI, validated by the shared schema. */
import { partTemplateCreateSchema, type PartTemplate, type PartTemplateCreate } from '@shared/schemas/library';
import type { PartKind } from '@shared/schemas/model';
import { defaultTemplates } from '@/components/canvas/defaultTemplates';

/** What the form edits; the rest of the body (layers' materials, TIM, bumps) comes from the template it starts from. */
export interface TemplateFormValues {
  name: string;
  note: string;
  kind: PartKind;
  widthMm: number | null;
  heightMm: number | null;
  dieUm: number | null;
  tiers: number | null;
  junction: number | null;
  extended: number | null;
}

/** Schema paths of the body → form fields, so server-side rule messages land beside the right input. */
const fieldOf: Record<string, keyof TemplateFormValues> = {
  name: 'name', note: 'note', 'part.kind': 'kind', 'part.width': 'widthMm', 'part.height': 'heightMm',
  'part.die.thickness': 'dieUm', 'part.memory.tiers': 'tiers', 'part.limits.junction': 'junction', 'part.limits.extended': 'extended',
};

/** Form values of an existing template, or of the built-in template of a kind. */
export function toForm(t: Pick<PartTemplate, 'name' | 'note' | 'part'> | null, kind: PartKind = 'compute'): TemplateFormValues {
  const part = t?.part ?? defaultTemplates[kind];
  return {
    name: t?.name ?? part.name, note: t?.note ?? '', kind: part.kind,
    widthMm: part.width * 1e3, heightMm: part.height * 1e3, dieUm: part.die.thickness * 1e6,
    tiers: part.memory?.tiers ?? null, junction: part.limits.junction, extended: part.limits.extended ?? null,
  };
}

const n = (v: number | null, scale = 1) => (v === null ? Number.NaN : v * scale);

/** Build and validate the template: the parsed body, or messages per form field. */
export function fromForm(v: TemplateFormValues, base: PartTemplate['part'] | null): { ok: true; value: PartTemplateCreate } | { ok: false; errors: Partial<Record<keyof TemplateFormValues | '_', string>> } {
  const start = base && base.kind === v.kind ? base : defaultTemplates[v.kind];
  const memory = v.kind === 'memory' ? { ...(start.memory ?? defaultTemplates.memory.memory!), tiers: n(v.tiers) } : undefined;
  const part = {
    ...start, kind: v.kind, width: n(v.widthMm, 1e-3), height: n(v.heightMm, 1e-3),
    die: { ...start.die, thickness: n(v.dieUm, 1e-6) }, memory,
    limits: { junction: n(v.junction), ...(v.extended === null ? {} : { extended: v.extended }) },
  };
  const parsed = partTemplateCreateSchema.safeParse({ name: v.name, note: v.note, part });
  if (parsed.success) return { ok: true, value: parsed.data };
  const errors: Partial<Record<keyof TemplateFormValues | '_', string>> = {};
  for (const issue of parsed.error.issues) {
    const path = issue.path.join('.');
    const known = fieldOf[path];
    if (known) errors[known] ??= issue.message;
    else errors._ ??= `${path}: ${issue.message}`;
  }
  return { ok: false, errors };
}
