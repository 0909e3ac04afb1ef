/**
 * Field paths from API error details (`geometry.traySpacing_mm`, `trays.3.vapourMassFlow_kg_h`,
 * `condenserDuty_kW`) in words for people: "tray spacing (mm)", "row 4, vapour mass flow (kg/h)".
 */
const UNITS: [RegExp, string][] = [
  [/_m3_h_m$/, ' (m³/(h·m))'],
  [/_kg_m3$/, ' (kg/m³)'],
  [/_mN_m$/, ' (mN/m)'],
  [/_mPa_s$/, ' (mPa·s)'],
  [/_kJ_kgK$/, ' (kJ/(kg·K))'],
  [/_kJ_kg$/, ' (kJ/kg)'],
  [/_kg_h$/, ' (kg/h)'],
  [/_m_s$/, ' (m/s)'],
  [/_kW$/, ' (kW)'],
  [/_kPa$/, ' (kPa)'],
  [/_m2$/, ' (m²)'],
  [/_mm$/, ' (mm)'],
  [/_m$/, ' (m)'],
  [/_C$/, ' (°C)'],
  [/_K$/, ' (K)'],
  [/_s$/, ' (s)'],
];

/** camelCase with a unit suffix in words: "downcomerTopArea_m2" → "downcomer top area (m²)". */
export function fieldWords(key: string): string {
  let unit = '';
  let base = key;
  for (const [re, u] of UNITS)
    if (re.test(key)) {
      unit = u;
      base = key.replace(re, '');
      break;
    }
  const words = base
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase()
    .trim();
  return words + unit;
}

/** A detail path in words; list indices become 1-based row numbers. */
export function pathWords(path: string): string {
  const parts = path.split(/[./]/).filter(Boolean);
  const out: string[] = [];
  for (const p of parts) {
    if (/^\d+$/.test(p)) out.push(`row ${Number(p) + 1}`);
    else if (p !== 'body' && p !== 'geometry') out.push(fieldWords(p));
  }
  return out.join(', ') || path;
}
