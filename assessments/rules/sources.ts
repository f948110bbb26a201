/** Names of the published sources the engine cites, written once so every reason spells them alike. */
export const SOURCES = {
  nioshManual: "NIOSH, Applications Manual for the Revised NIOSH Lifting Equation, Pub. 94-110 (1994, rev. 2021)",
  nioshFrequencyTable: "NIOSH Applications Manual, Pub. 94-110, Table 5 (frequency multiplier)",
  nioshCouplingTable: "NIOSH Applications Manual, Pub. 94-110, Table 7 (coupling multiplier)",
  nioshComposite: "NIOSH Applications Manual, Pub. 94-110, §2.4 (multi-task jobs, composite lifting index)",
  hseL23: "HSE L23, Manual handling: Guidance on Regulations, 4th ed. 2016",
  hseIndg143: "HSE INDG143, Manual handling at work: a brief guide",
  iso11228: "ISO 11228-1:2021, cumulative mass (from memory)",
  heftwisePolicy: "Heftwise policy (see DEVELOPERS.md, Rules policy); no published source",
} as const;
