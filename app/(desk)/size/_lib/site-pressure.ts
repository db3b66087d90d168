import { standardAtmospherePressurePa } from '@/lib/units';

/** Site conditions as an account stores them. */
export type SiteConditions = { barometricPressureKpa: number | null; siteAltitudeM: number | null };

export type SitePressure = { kpa: number; source: string };

/**
 * The barometric pressure gauge readings are taken against: the account's stated pressure, else its
 * altitude through the standard atmosphere, else 101.325 kPa [pub: ISO 2533].
 */
export function sitePressureOf(site: SiteConditions | null | undefined): SitePressure {
  if (site?.barometricPressureKpa != null) return { kpa: site.barometricPressureKpa, source: 'stated for the account' };
  if (site?.siteAltitudeM != null) {
    const kpa = Number((standardAtmospherePressurePa(site.siteAltitudeM) / 1000).toFixed(3));
    return { kpa, source: `from site altitude ${site.siteAltitudeM} m (ISO 2533 standard atmosphere)` };
  }
  return { kpa: 101.325, source: 'standard atmosphere (no site data)' };
}
