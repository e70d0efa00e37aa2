// ISO/IEC 11801-1 cabled-fibre limits with the ISO/IEC 14763-3 test limits for the end connections
// to reference-grade test cords.
import type { Profile } from "../schema";
import * as c from "./common";

const ISO_ATT = "ISO/IEC 11801-1:2017 cabled optical fibre attenuation";

export const isoIec11801: Profile = {
  slug: "iso-iec-11801-1-14763-3",
  version: 1,
  name: "ISO/IEC 11801-1 with 14763-3 test limits",
  description:
    "Cabled fibre attenuation of ISO/IEC 11801-1 (OM1-OM5, OS1a, OS2) and the reference-grade end-connection allowances of ISO/IEC 14763-3, with IEEE 802.3 application limits.",
  limits: {
    ...c.SHARED_LIMITS,
    attenuation: [
      { fibreTypes: [...c.MULTIMODE_FIBRES], wavelengthNm: 850, maxDbPerKm: 3.5, source: `${ISO_ATT}, 3.5 dB/km at 850 nm (from memory)` },
      { fibreTypes: ["OM5"], wavelengthNm: 953, maxDbPerKm: 2.3, source: "TIA-492AAAE / IEC 60793-2-10 A1a.4 OM5 at 953 nm (from memory)" },
      { fibreTypes: [...c.MULTIMODE_FIBRES], wavelengthNm: 1300, maxDbPerKm: 1.5, source: `${ISO_ATT}, 1.5 dB/km at 1300 nm (from memory)` },
      ...[1310, 1383, 1550].map((wavelengthNm) => ({
        fibreTypes: ["OS1a" as const],
        wavelengthNm,
        maxDbPerKm: 1.0,
        source: `${ISO_ATT}, OS1a 1.0 dB/km (from memory)`,
      })),
      ...[1310, 1383, 1550].map((wavelengthNm) => ({
        fibreTypes: ["OS2" as const, "G.652.D" as const, "G.657.A1" as const, "G.657.A2" as const, "G.657.B3" as const],
        wavelengthNm,
        maxDbPerKm: 0.4,
        source:
          wavelengthNm === 1310
            ? `${ISO_ATT}, OS2 0.4 dB/km (seen at 1310 nm in an IEEE channel table); G.652.D/G.657 cabled as OS2 (common practice)`
            : `${ISO_ATT}, OS2 0.4 dB/km (from memory); G.652.D/G.657 cabled as OS2 (common practice)`,
      })),
    ],
    connectorLossDb: { value: 0.75, source: "ISO/IEC 11801-1 / ISO/IEC 14763-3 mated connection 0.75 dB (partly seen in a secondary source)" },
    endConnectionLossDb: {
      multimode: { value: 0.3, source: "ISO/IEC 14763-3 reference-grade to standard-grade connection, multimode 0.3 dB (from memory)" },
      singlemode: { value: 0.5, source: "ISO/IEC 14763-3 reference-grade to standard-grade connection, single-mode 0.5 dB (from memory)" },
    },
    spliceLossDb: { value: 0.3, source: "ISO/IEC 11801-1 splice 0.3 dB (from memory)" },
    reflectanceMaxDb: {
      multimode: { value: -20, source: "ISO/IEC 11801-1 connection return loss at least 20 dB, multimode (from memory)" },
      upc: { value: -35, source: "ISO/IEC 11801-1 connection return loss at least 35 dB, single-mode (from memory)" },
      apc: { value: -55, source: "ANSI/TIA-568.3-D APC return loss 55 dB used for angled connectors (from memory)" },
    },
    spliceReflectanceMaxDb: c.TIA_SPLICE_REFLECTANCE,
    orlMinDb: {},
    applications: c.IEEE_APPLICATIONS,
    ponClasses: [],
  },
};
