/** Import and export: file downloads (model JSON, CSVs, SPICE netlist) and imports (model file, floorplan CSV). */
import type { FloorplanPreview, PowerMapPreview } from '@shared/export/requests';
import { ApiError, http } from './http';
import type { Variant } from './types';

/** What the server can export for a variant. */
export type ExportKind = 'model' | 'matrix' | 'nodes' | 'contribution' | 'temperatures' | 'netlist' | 'netlist-steady';

/** URL of one export of a variant (scenario where the export depends on one). */
export function exportUrl(vid: number, kind: ExportKind, scenario?: string): string {
  const q = (params: Record<string, string | undefined>) => {
    const s = new URLSearchParams(Object.entries(params).filter((e): e is [string, string] => !!e[1])).toString();
    return s ? `?${s}` : '';
  };
  const base = `/api/variants/${vid}`;
  switch (kind) {
    case 'model': return `${base}/export.json`;
    case 'matrix': case 'nodes': case 'contribution': return `${base}/export/matrix.csv${q({ kind: kind === 'matrix' ? 'influence' : kind, scenario })}`;
    case 'temperatures': return `${base}/export/temperatures.csv${q({ scenario })}`;
    case 'netlist': return `${base}/export/netlist.cir${q({ scenario })}`;
    case 'netlist-steady': return `${base}/export/netlist.cir${q({ scenario, model: 'steady' })}`;
  }
}

function filenameOf(res: Response, fallback: string): string {
  const m = /filename\*?=(?:UTF-8'')?"?([^";]+)"?/i.exec(res.headers.get('content-disposition') ?? '');
  return m ? decodeURIComponent(m[1]) : fallback;
}

/** Save a blob as a file through a temporary link. */
export function saveBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** Fetch an export and save it under the server's file name; server errors become ApiError. */
export async function downloadExport(url: string, fallbackName = 'heatloom-export'): Promise<string> {
  const res = await fetch(url, { credentials: 'same-origin' });
  if (!res.ok) {
    const body = await res.json().catch(() => null) as { error?: { code?: string; message?: string } } | null;
    throw new ApiError(res.status, body?.error?.code ?? 'http', body?.error?.message ?? `Export failed (${res.status})`);
  }
  const name = filenameOf(res, fallbackName);
  saveBlob(await res.blob(), name);
  return name;
}

/** Import a model file (its text) as a new variant of the assembly. */
export const importModel = (aid: number, body: { text: string; name?: string; note?: string }) => http.post<Variant>(`/api/assemblies/${aid}/import`, body);

/** Import a floorplan CSV onto a base variant (default: the assembly's first) as a new variant. */
export const importFloorplan = (aid: number, body: { csv: string; name?: string; note?: string; baseVariantId?: number }) =>
  http.post<Variant>(`/api/assemblies/${aid}/import/floorplan`, body);

/** Read a floorplan CSV on the server: parts and line-numbered errors; saves nothing. */
export const previewFloorplan = (csv: string) => http.post<FloorplanPreview>('/api/import/floorplan/preview', { csv });

/** Read a power-map CSV on the server: the grid or line-numbered errors; saves nothing. */
export const readPowerMap = (csv: string) => http.post<PowerMapPreview>('/api/import/power-map', { csv });
