// The invented demo catalog: made-up makers and models with figures in the
// range of current residential equipment. No real product.
import type { Transaction } from "sequelize";
import { Equipment } from "@/models";
import { EquipmentInput } from "@/lib/schemas/equipment";

const UL_MODULE = "UL 61730";
const UL_INVERTER = "UL 1741 SB";

export const DEMO_CATALOG: EquipmentInput[] = [
  {
    kind: "module", maker: "Larkspur", model: "LK-405M-54H", listing: UL_MODULE,
    specs: { powerW: 405, vocV: 37.2, vmpV: 31.0, iscA: 13.85, impA: 13.07, vocTempCoeff: { value: -0.27, unit: "%/C" }, pmaxTempCoeffPctPerC: -0.34, maxSeriesFuseA: 25, maxSystemVoltageV: 1000, lengthIn: 67.8, widthIn: 44.6, weightLb: 46.3 },
  },
  {
    kind: "module", maker: "Northmere", model: "NM-380B Slate", listing: UL_MODULE,
    specs: { powerW: 380, vocV: 41.6, vmpV: 34.5, iscA: 11.62, impA: 11.02, vocTempCoeff: { value: -0.28, unit: "%/C" }, pmaxTempCoeffPctPerC: -0.35, maxSeriesFuseA: 20, maxSystemVoltageV: 1000, lengthIn: 69.1, widthIn: 40.9, weightLb: 44.1 },
  },
  {
    // Entered in V/°C, as some data sheets give it.
    kind: "module", maker: "Fenwick", model: "FW-440-HC72", listing: UL_MODULE,
    specs: { powerW: 440, vocV: 49.4, vmpV: 41.2, iscA: 11.32, impA: 10.68, vocTempCoeff: { value: -0.136, unit: "V/C" }, pmaxTempCoeffPctPerC: -0.35, maxSeriesFuseA: 20, maxSystemVoltageV: 1000, lengthIn: 82.0, widthIn: 40.9, weightLb: 52.9 },
  },
  {
    kind: "module", maker: "Halvard", model: "HV-370 Black", listing: UL_MODULE,
    specs: { powerW: 370, vocV: 40.8, vmpV: 34.0, iscA: 11.45, impA: 10.89, pmaxTempCoeffPctPerC: -0.36, maxSeriesFuseA: 20, maxSystemVoltageV: 1000, lengthIn: 68.5, widthIn: 40.6, weightLb: 43.0 },
  },
  {
    kind: "inverter", maker: "Quillon", model: "QS-7600", listing: UL_INVERTER,
    specs: {
      inverterKind: "string", acPowerW: 7600, acOutputCurrentA: 32, acVoltageV: 240, phase: 1, maxDcInputV: 600, mpptMinV: 200, mpptMaxV: 480, maxInputIscA: 15, mpptCount: 2,
      certification: "UL 1741 SB; IEEE 1547-2018 Category B", meetsRapidShutdownWithDevices: false,
      terminalTempC: 75, dcArcFaultProtection: true, dcGroundFaultProtection: true, dcDisconnect: true,
    },
  },
  {
    kind: "inverter", maker: "Quillon", model: "QS-3800", listing: UL_INVERTER,
    specs: {
      inverterKind: "string", acPowerW: 3800, acOutputCurrentA: 16, acVoltageV: 240, phase: 1, maxDcInputV: 600, mpptMinV: 120, mpptMaxV: 480, maxInputIscA: 15, mpptCount: 1,
      certification: "UL 1741 SB; IEEE 1547-2018 Category B", meetsRapidShutdownWithDevices: false,
      terminalTempC: 75, dcArcFaultProtection: true, dcGroundFaultProtection: true, dcDisconnect: true,
    },
  },
  {
    // Made for optimizer strings: the optimizers hold the string at a fixed voltage.
    kind: "inverter", maker: "Calderby", model: "CB-6000R", listing: UL_INVERTER,
    specs: {
      inverterKind: "string", acPowerW: 6000, acOutputCurrentA: 25, acVoltageV: 240, phase: 1, maxDcInputV: 480, maxInputIscA: 16.5, mpptCount: 1,
      regulatedStringV: 380, maxStringPowerW: 5700, certification: "UL 1741 SB; IEEE 1547-2018 Category B", meetsRapidShutdownWithDevices: true,
      terminalTempC: 75, dcArcFaultProtection: true, dcGroundFaultProtection: true, dcDisconnect: true,
    },
  },
  {
    kind: "inverter", maker: "Pellinore", model: "PM-320 Micro", listing: UL_INVERTER,
    specs: {
      inverterKind: "micro", acPowerW: 320, acOutputCurrentA: 1.33, acVoltageV: 240, phase: 1, maxDcInputV: 60, mpptMinV: 27, mpptMaxV: 45, maxInputIscA: 14, mpptCount: 1,
      certification: "UL 1741 SB; IEEE 1547-2018 Category B", meetsRapidShutdownWithDevices: true, reportsPerModule: true,
      terminalTempC: 75, dcGroundFaultProtection: true, dcDisconnect: true,
    },
  },
  {
    kind: "device", maker: "Calderby", model: "CB-P450 Optimizer", listing: "UL 1741; UL 3741 PV hazard control with CB-6000R",
    specs: { deviceKind: "optimizer", ratedInputPowerW: 450, maxInputV: 60, maxInputIscA: 15, maxOutputCurrentA: 15, shutdownOutputV: 1, maxSystemVoltageV: 1000, reportsPerModule: true },
  },
  {
    kind: "device", maker: "Stavemoor", model: "SR-1 Shutdown Unit", listing: "UL 1741 PVRSE",
    specs: { deviceKind: "shutdown-device", ratedInputPowerW: 500, maxInputV: 80, maxInputIscA: 15, maxOutputCurrentA: 15, shutdownOutputV: 0.6, maxSystemVoltageV: 1000 },
  },
];

/** Adds the demo catalog to one organization inside the seed's transaction; each item passes the same schema as a form would. */
export async function seedDemoCatalog(organizationId: string, transaction: Transaction) {
  const rows = DEMO_CATALOG.map((item) => {
    const { kind, maker, model, listing, specs } = EquipmentInput.parse(item);
    return { organizationId, kind, maker, model, listing, specs };
  });
  await Equipment.bulkCreate(rows, { transaction });
}
