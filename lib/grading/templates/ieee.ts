// IEEE 802.3 applications: the channel insertion loss and reach of each Ethernet PHY on the fibre
// types it allows; the cabling loss budget underneath uses ISO/IEC 11801-1 values.
import type { Profile } from "../schema";
import * as c from "./common";
import { isoIec11801 } from "./iso";

// The IEEE channel figures assume standard connections throughout, so the ISO reference-grade end
// allowance is left out.
const { endConnectionLossDb: _referenceGradeEnds, ...isoLimits } = isoIec11801.limits;

export const ieee8023Applications: Profile = {
  slug: "ieee-802-3-applications",
  version: 1,
  name: "IEEE 802.3 Ethernet applications",
  description:
    "Grades a link against the channel insertion loss and reach of its Ethernet application (1000BASE-SX/LX, 10GBASE-SR/LR, 25GBASE-SR, 40GBASE-SR4, 100GBASE-SR4/LR4, 400GBASE-SR8/DR4); the tighter of that and the ISO/IEC 11801-1 loss budget applies.",
  limits: {
    ...isoLimits,
    attenuation: [
      ...isoLimits.attenuation.filter((r) => !(r.wavelengthNm === 1310 && r.fibreTypes.includes("OS2"))),
      {
        fibreTypes: ["OS2", "G.652.D", "G.657.A1", "G.657.A2", "G.657.B3"],
        wavelengthNm: 1310,
        maxDbPerKm: 0.4,
        source: "IEEE 802.3 single-mode planning attenuation 0.4 dB/km at 1310 nm (seen, TIA FOTC summary of Clause 122)",
      },
    ],
    connectorLossDb: c.TIA_CONNECTOR_LOSS,
    applications: c.IEEE_APPLICATIONS,
  },
};
