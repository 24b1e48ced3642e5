/**
 * A blower table: the airflow each speed tap delivers at several external static pressures, as the
 * equipment's airflow data gives it. Compact text form for a catalog CSV cell:
 * `low:0.3=900/0.5=820;med:0.3=1100/0.5=1020;high:0.3=1300/0.5=1210` (tap:static=CFM/…;…).
 */

export interface BlowerPoint {
  /** External static pressure, in. w.c. */
  staticInWc: number;
  /** Airflow at that static, CFM. */
  cfm: number;
}

export interface BlowerTap {
  tap: string;
  points: BlowerPoint[];
}

export type BlowerTable = BlowerTap[];

/** Parses the compact text form; returns an error message in plain words when it cannot. */
export function parseBlowerTable(text: string): { table: BlowerTable } | { error: string } {
  const table: BlowerTable = [];
  for (const tapText of text
    .split(';')
    .map((s) => s.trim())
    .filter(Boolean)) {
    const colon = tapText.indexOf(':');
    if (colon <= 0) return { error: `Blower table: "${tapText}" should read tap:static=CFM/static=CFM` };
    const tap = tapText.slice(0, colon).trim();
    const points: BlowerPoint[] = [];
    for (const pointText of tapText
      .slice(colon + 1)
      .split('/')
      .map((s) => s.trim())
      .filter(Boolean)) {
      const [s, c] = pointText.split('=').map((x) => Number(x.trim()));
      if (!Number.isFinite(s) || !Number.isFinite(c) || s < 0 || s > 2 || c < 100 || c > 10000) {
        return { error: `Blower table: "${pointText}" on tap ${tap} should read static=CFM, static 0–2 in. w.c., CFM 100–10,000` };
      }
      points.push({ staticInWc: s, cfm: c });
    }
    if (points.length === 0) return { error: `Blower table: tap ${tap} has no static=CFM points` };
    points.sort((a, b) => a.staticInWc - b.staticInWc);
    table.push({ tap, points });
  }
  if (table.length === 0) return { error: 'Blower table is empty' };
  return { table };
}

/** The compact text form of a blower table (inverse of parseBlowerTable). */
export function formatBlowerTable(table: BlowerTable): string {
  return table.map((t) => `${t.tap}:${t.points.map((p) => `${p.staticInWc}=${p.cfm}`).join('/')}`).join(';');
}

/**
 * A tap's airflow (CFM) at an external static pressure (in. w.c.), interpolated linearly between
 * the table's points; undefined outside the tabulated range (no extrapolation: the fan curve is not
 * known there).
 */
export function tapCfmAt(tap: BlowerTap, staticInWc: number): number | undefined {
  const pts = tap.points;
  if (pts.length === 0) return undefined;
  const eps = 1e-9;
  if (staticInWc < pts[0].staticInWc - eps || staticInWc > pts[pts.length - 1].staticInWc + eps) return undefined;
  for (let i = 0; i < pts.length; i++) {
    if (Math.abs(pts[i].staticInWc - staticInWc) <= eps) return pts[i].cfm;
    if (i > 0 && staticInWc < pts[i].staticInWc) {
      const a = pts[i - 1];
      const b = pts[i];
      return a.cfm + ((b.cfm - a.cfm) * (staticInWc - a.staticInWc)) / (b.staticInWc - a.staticInWc);
    }
  }
  return undefined;
}
