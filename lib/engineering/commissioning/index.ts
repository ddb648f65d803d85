// Commissioning checks for the installer's field record: pure functions, no I/O.
// One file per check, listed in the order the crew works (check-record.ts runs them in that order).
export * from "./types";
// Before anything is energized, each string
export * from "./string-polarity";
export * from "./string-voc";
export * from "./insulation-resistance";
// At the inverter
export * from "./inverter-serial";
export * from "./inverter-activation";
export * from "./grid-profile";
export * from "./device-pairing";
export * from "./shutdown-string";
// The AC side, once connected
export * from "./service-voltage";
export * from "./ac-voltage";
export * from "./first-power";
export * from "./modules-reporting";
export * from "./rapid-shutdown-test";
// With batteries
export * from "./storage-tests";
// The whole record
export * from "./check-record";
export * from "./completion";
