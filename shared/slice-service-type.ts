// The one wording of a slice/service type (SST) on every screen: its standard name, or "SST n".

/**
 * Standardized SST values, 3GPP TS 23.501 Table 5.15.2.2-1: 1 eMBB, 2 URLLC, 3 MIoT, 4 V2X, 5 HMTC
 * (6 HDLLC and 7 GBRSS from memory of later releases). Values 128–255 are operator-specific (TS 24.501
 * §9.11.2.8) and have no standard name.
 */
const SST_NAMES: Record<number, string> = { 1: 'eMBB', 2: 'URLLC', 3: 'MIoT', 4: 'V2X', 5: 'HMTC', 6: 'HDLLC', 7: 'GBRSS' };

/** The SST's standard name, or "SST n" when the standard defines none. */
export function sstName(sst: number): string {
  return SST_NAMES[sst] ?? `SST ${sst}`;
}
