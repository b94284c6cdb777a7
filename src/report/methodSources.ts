/** The published sources the report cites, keyed for the assumption rows (see REFERENCES.md). */
export const METHOD_SOURCES = {
  erickson: "R. W. Erickson, D. Maksimović, Fundamentals of Power Electronics, ch. 2–3 (CCM, volt-second balance, inductor resistance) and ch. 5 (DCM)",
  maniktala: "S. Maniktala, Switching Power Supplies A to Z (ripple ratio r = ΔI/IL)",
  iec60028: "IEC 60028, International Standard of Resistance for Copper (α20 = 0.00393 /K)",
  igse:
    "K. Venkatachalam, C. R. Sullivan, T. Abdallah, H. Tacca, “Accurate Prediction of Ferrite Core Loss with Nonsinusoidal Waveforms Using Only Steinmetz Parameters”, IEEE COMPEL 2002 (iGSE)",
  iec62024: "IEC 62024-2, rated current of inductors for DC-DC converters (saturation- and temperature-rise-limited currents)",
  mclyman: "W. T. McLyman, Transformer and Inductor Design Handbook, 3rd ed. (surface-dissipation rule, quoted from memory)",
  textbook: "standard textbook material, quoted from memory (no single source)",
  practice: "common practice (no single published source)",
  coilsift: "Coilsift's own convention (not a published method)",
} as const;

export type SourceKey = keyof typeof METHOD_SOURCES;
