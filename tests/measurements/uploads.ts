import type { ApiClient, ApiReply } from '../helpers/api-client';
import { planck, spectrumCsv, wavelengths } from './spectra';

/** The worked example: a 3 × 3 grid of 400, 450 … 800 µmol m⁻² s⁻¹ (mean 600, min/mean 0.6667, min/max 0.5, CV 0.21517). */
export const GRID_3X3 = '400,450,500\r\n550,600,650\r\n700,750,800\r\n';

/** A Planckian radiator at 2856 K, W m⁻² nm⁻¹ up to a factor, 360–830 nm every 5 nm (c2 = 1.4388e-2 m·K). */
export const PLANCK_2856 = spectrumCsv(wavelengths(360, 830, 5), (nm) => planck(nm, 2856), 'wavelength_nm,irradiance');

/** Form fields of an upload; values are sent as text, as a browser form sends them. */
export type UploadFields = Record<string, string | number | undefined>;

/**
 * Sends a multipart upload as the web client does (session cookie, X-CSRF-Token), with the file's
 * bytes in the field `file`. `file: null` sends no file.
 */
export async function upload(c: ApiClient, wid: string, fields: UploadFields, file: { name: string; bytes: string | Uint8Array<ArrayBuffer> } | null): Promise<ApiReply> {
  if (c.csrfToken === undefined) await c.refreshCsrf();
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) if (v !== undefined) form.append(k, String(v));
  if (file) form.append('file', new Blob([typeof file.bytes === 'string' ? new TextEncoder().encode(file.bytes) : file.bytes], { type: 'text/csv' }), file.name);
  const res = await fetch(`${c.base}/api/workspaces/${wid}/measurements`, {
    method: 'POST',
    headers: { cookie: c.jar.header() ?? '', 'x-csrf-token': c.csrfToken ?? '' },
    body: form,
  });
  const text = await res.text();
  return { status: res.status, headers: res.headers, text, body: text && (res.headers.get('content-type') ?? '').includes('json') ? JSON.parse(text) : undefined };
}

/** Downloads a stored file's bytes. */
export async function download(c: ApiClient, wid: string, mid: string): Promise<{ status: number; headers: Headers; bytes: Buffer }> {
  const res = await fetch(`${c.base}/api/workspaces/${wid}/measurements/${mid}/file`, { headers: { cookie: c.jar.header() ?? '' } });
  return { status: res.status, headers: res.headers, bytes: Buffer.from(await res.arrayBuffer()) };
}
