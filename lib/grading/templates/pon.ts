// ITU-T PON templates: G-PON optical distribution network classes (G.984.2) and XGS-PON classes
// (G.9807.1). The ODN loss must fall inside the class range at every tested wavelength.
import type { Limits, Profile } from "../schema";
import * as c from "./common";

const G652D = "ITU-T G.652 Table 2 (G.652.D cable), from memory";

// G.652.D cable: 0.4 dB/km anywhere in 1310-1625 nm and 0.3 dB/km at 1550 nm. 1270 nm lies just
// below that range; the 0.4 dB/km figure is carried over to it (common practice).
const PON_ATTENUATION: Limits["attenuation"] = [
  { fibreTypes: [...c.SINGLEMODE_FIBRES], wavelengthNm: 1270, maxDbPerKm: 0.4, source: `${G652D}; extended to 1270 nm (common practice)` },
  ...[1310, 1383, 1490, 1577, 1625].map((wavelengthNm) => ({ fibreTypes: [...c.SINGLEMODE_FIBRES], wavelengthNm, maxDbPerKm: 0.4, source: `${G652D}, 0.4 dB/km in 1310-1625 nm` })),
  { fibreTypes: [...c.SINGLEMODE_FIBRES], wavelengthNm: 1550, maxDbPerKm: 0.3, source: `${G652D}, 0.3 dB/km at 1550 nm` },
];

function ponLimits(ponClasses: Limits["ponClasses"], defaultPonClass: string, standard: string): Limits {
  return {
    ...c.SHARED_LIMITS,
    attenuation: PON_ATTENUATION,
    connectorLossDb: { value: 0.5, source: "ITU-T G.671 connection loss 0.5 dB used in ITU planning (seen, as cited by a trade-association article)" },
    spliceLossDb: { value: 0.15, source: "FOA Reference Guide planning value for single-mode splices, 0.15 dB (trade association, seen)" },
    reflectanceMaxDb: {
      multimode: c.TIA_REFLECTANCE.multimode,
      upc: { value: -35, source: `${standard} maximum discrete reflectance between S and R, -35 dB (ITU-T G.984.2 cl. 8.2.7.3; clause seen, value from memory)` },
      apc: c.TIA_REFLECTANCE.apc,
    },
    orlMinDb: {
      singlemode: { value: 32, source: `${standard} minimum ODN optical return loss 32 dB (ITU-T G.984.2 cl. 8.2.7.2; clause seen, value from memory)` },
    },
    applications: [],
    ponClasses,
    defaultPonClass,
  };
}

type PonRow = Limits["ponClasses"][number];
type Window = PonRow["receiverWindows"][number];
function window(receiver: string, wavelengthNm: number, minDbm: number, maxDbm: number, source: string): Window {
  return { receiver, wavelengthNm, minDbm: { value: minDbm, source }, maxDbm: { value: maxDbm, source } };
}
function ponClass(family: string, name: string, min: number, minSource: string, max: number, maxSource: string, receiverWindows: Window[] = []): PonRow {
  return { ponClass: name, family, minLossDb: { value: min, source: minSource }, maxLossDb: { value: max, source: maxSource }, receiverWindows };
}

const G984 = "ITU-T G.984.2 cl. 8.2.7.1 ODN attenuation classes";
export const gpon: Profile = {
  slug: "itu-t-g984-2-gpon",
  version: 1,
  name: "ITU-T G.984.2 G-PON ODN classes",
  description: "Optical distribution network loss of G-PON: class B+ by default, C+ and the original A, B, C on request (link.ponClass).",
  limits: ponLimits(
    [
      ponClass("G-PON", "A", 5, `${G984}, class A 5-20 dB (seen in a secondary source)`, 20, `${G984}, class A 5-20 dB (seen in a secondary source)`),
      ponClass("G-PON", "B", 10, `${G984}, class B 10-25 dB (seen in a secondary source)`, 25, `${G984}, class B 10-25 dB (seen in a secondary source)`),
      ponClass("G-PON", "C", 15, `${G984}, class C 15-30 dB (seen in a secondary source)`, 30, `${G984}, class C 15-30 dB (seen in a secondary source)`),
      ponClass(
        "G-PON",
        "B+",
        13,
        "ITU-T G.984.2 Amd.1 class B+ minimum 13 dB (from memory)",
        28,
        "ITU-T G.984.2 Amd.1 class B+ maximum 28 dB (seen in secondary sources)",
        [
          window("ONU", 1490, -27, -8, "ITU-T G.984.2 Amd.1 class B+ ONU receiver: sensitivity -27 dBm, overload -8 dBm (from memory)"),
          window("OLT", 1310, -28, -8, "ITU-T G.984.2 Amd.1 class B+ OLT receiver: sensitivity -28 dBm, overload -8 dBm (from memory)"),
        ],
      ),
      ponClass(
        "G-PON",
        "C+",
        17,
        "ITU-T G.984.2 Amd.2 class C+ minimum 17 dB (from memory)",
        32,
        "ITU-T G.984.2 Amd.2 class C+ maximum 32 dB (seen in a secondary source)",
        [
          window("ONU", 1490, -30, -8, "ITU-T G.984.2 Amd.2 class C+ ONU receiver: sensitivity -30 dBm, overload -8 dBm (from memory)"),
          window("OLT", 1310, -32, -12, "ITU-T G.984.2 Amd.2 class C+ OLT receiver: sensitivity -32 dBm, overload -12 dBm (from memory)"),
        ],
      ),
    ],
    "B+",
    "ITU-T G.984.2",
  ),
};

const G9807 = "ITU-T G.9807.1 Annex B nominal ODN classes (the ranges of ITU-T G.987.2 cl. 6.1, seen in a secondary source; reuse in G.9807.1 from memory)";
const XGS_ONU = "ITU-T G.9807.1 XGS-PON ONU receiver: sensitivity -28 dBm, overload -9 dBm (from memory, low confidence)";
export const xgsPon: Profile = {
  slug: "itu-t-g9807-1-xgs-pon",
  version: 1,
  name: "ITU-T G.9807.1 XGS-PON ODN classes",
  description: "Optical distribution network loss of XGS-PON: class N1 by default, N2, E1 and E2 on request (link.ponClass).",
  limits: ponLimits(
    [
      ponClass("XGS-PON", "N1", 14, `${G9807}, N1 14-29 dB`, 29, `${G9807}, N1 14-29 dB`, [window("ONU", 1577, -28, -9, XGS_ONU)]),
      ponClass("XGS-PON", "N2", 16, `${G9807}, N2 16-31 dB`, 31, `${G9807}, N2 16-31 dB`, [window("ONU", 1577, -28, -9, XGS_ONU)]),
      ponClass("XGS-PON", "E1", 18, `${G9807}, E1 18-33 dB`, 33, `${G9807}, E1 18-33 dB`),
      ponClass("XGS-PON", "E2", 20, `${G9807}, E2 20-35 dB`, 35, `${G9807}, E2 20-35 dB`),
    ],
    "N1",
    "ITU-T G.9807.1",
  ),
};
