/** The cautions every report carries, in Coilsift's own words (shown at the top and in full at the end). */
export const REPORT_CAUTIONS: readonly string[] = [
  "Every figure in this report is an estimate from a model and from the numbers in the part lists. It is a screening aid, not a qualification of any part.",
  "Before committing to a part, verify each figure against the maker's current datasheet (inductance versus current and temperature, DCR, rated currents and the conditions they are defined at) and measure the inductor in the real circuit on the bench: peak current, temperature rise and behaviour at the worst input and load.",
  "Part lists can be out of date, mistyped or mapped to the wrong unit; the column mapping and each part's data basis are listed so that they can be checked.",
  "For mains-connected or high-energy designs, follow the safety standards and codes that apply where the product is built and used, and have the design reviewed under licensed engineering practice. This report does not replace either.",
];

/** One line for the top of the first page. */
export const CAUTION_SUMMARY =
  "Estimates only. Verify against the maker's datasheet and on the bench; for mains or high-energy designs follow local codes and licensed practice.";
