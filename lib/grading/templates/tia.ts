// ANSI/TIA-568.3-D templates: multimode, single-mode inside plant and single-mode outside plant.
import type { Limits, Profile } from "../schema";
import * as c from "./common";

const MM_ATTENUATION: Limits["attenuation"] = [
  {
    fibreTypes: [...c.MULTIMODE_FIBRES],
    wavelengthNm: 850,
    maxDbPerKm: 3.5,
    source: "ANSI/TIA-568.3-D Table 1, 3.5 dB/km at 850 nm (partly seen in a secondary source quoting TIA-568; value from memory)",
  },
  { fibreTypes: ["OM5"], wavelengthNm: 953, maxDbPerKm: 2.3, source: "ANSI/TIA-568.3-D Table 1 / TIA-492AAAE, OM5 at 953 nm (from memory)" },
  { fibreTypes: [...c.MULTIMODE_FIBRES], wavelengthNm: 1300, maxDbPerKm: 1.5, source: "ANSI/TIA-568.3-D Table 1, 1.5 dB/km at 1300 nm (from memory)" },
];

function singlemodeAttenuation(dbPerKm: number, source: string): Limits["attenuation"] {
  return [1310, 1550].map((wavelengthNm) => ({ fibreTypes: [...c.SINGLEMODE_FIBRES], wavelengthNm, maxDbPerKm: dbPerKm, source }));
}

function tiaLimits(attenuation: Limits["attenuation"]): Limits {
  return {
    ...c.SHARED_LIMITS,
    attenuation,
    connectorLossDb: c.TIA_CONNECTOR_LOSS,
    spliceLossDb: c.TIA_SPLICE_LOSS,
    reflectanceMaxDb: c.TIA_REFLECTANCE,
    spliceReflectanceMaxDb: c.TIA_SPLICE_REFLECTANCE,
    orlMinDb: {},
    applications: c.IEEE_APPLICATIONS,
    ponClasses: [],
  };
}

export const tiaMultimode: Profile = {
  slug: "tia-568-3-d-multimode",
  version: 1,
  name: "TIA-568.3-D multimode",
  description: "Link loss budget of ANSI/TIA-568.3-D for OM1-OM5 cabling at 850 and 1300 nm (953 nm for OM5), with IEEE 802.3 application limits.",
  limits: tiaLimits(MM_ATTENUATION),
};

export const tiaSinglemodeInsidePlant: Profile = {
  slug: "tia-568-3-d-singlemode-isp",
  version: 1,
  name: "TIA-568.3-D single-mode, inside plant",
  description: "Link loss budget of ANSI/TIA-568.3-D for single-mode inside-plant cable (1.0 dB/km at 1310 and 1550 nm).",
  limits: tiaLimits(
    singlemodeAttenuation(1.0, "ANSI/TIA-568.3-D Table 1, inside-plant cable 1.0 dB/km (partly seen: 1.0 dB/km for OS1a indoor in an IEEE planning table)"),
  ),
};

export const tiaSinglemodeOutsidePlant: Profile = {
  slug: "tia-568-3-d-singlemode-osp",
  version: 1,
  name: "TIA-568.3-D single-mode, outside plant",
  description: "Link loss budget of ANSI/TIA-568.3-D for single-mode outside-plant and indoor-outdoor cable (0.5 dB/km at 1310 and 1550 nm).",
  limits: tiaLimits(
    singlemodeAttenuation(0.5, "ANSI/TIA-568.3-D Table 1, outside-plant cable 0.5 dB/km at either wavelength (seen in a secondary source quoting TIA-568)"),
  ),
};
