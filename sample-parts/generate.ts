/**
 * Writes the invented demo catalogs: demo-parts.csv (about 300 parts) and three vendor-style
 * variants of a 60-part subset that differ in header names, units and layout.
 * Run: node --import tsx sample-parts/generate.ts
 *
 * Makers, series and part numbers are invented. The electrical values follow simple scaling
 * rules so that the demo behaves like a real catalog:
 *  - stored energy ½·L·Isat² is proportional to core volume (so Isat ∝ 1/√L within a size);
 *  - DCR ∝ L within a size (turns² at a fixed window) and ∝ 1/s² across sizes (s = ∛volume);
 *  - the heating current follows from a dissipation limit proportional to surface area;
 *  - SRF ∝ L^-0.6 (winding capacitance grows with turns while L grows with turns²).
 * A seeded generator adds a few percent of scatter, so the files are byte-for-byte reproducible.
 */
import { writeFileSync } from "node:fs";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";

const here = dirname(fileURLToPath(import.meta.url));

/** mulberry32: tiny deterministic PRNG, enough for reproducible scatter. */
export function makeRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

interface Construction {
  maker: string;
  series: string;
  prefix: string;
  material: string;
  /** Stored energy per core volume at Isat, µJ/mm³. */
  energyDensity: number;
  /** DCR per µH at the reference size s = 4.2 mm, mΩ. */
  dcrPerMicrohenry: number;
  dcrMaxFactor: number;
  /** Inductance drop at which Isat is stated, %. */
  isatDrop: number;
  irmsRise: number;
  /** Dissipation allowed at the rated rise, W per mm² of surface. */
  heatFlux: number;
  srfAt1uH: number;
  /** Price: base + perVolume·V^0.7, USD. */
  priceBase: number;
  pricePerVolume: number;
  sizes: [number, number, number][];
}

const L_SERIES = [0.33, 0.47, 0.68, 1, 1.5, 2.2, 3.3, 4.7, 6.8, 10, 15, 22, 33, 47, 68, 100];

const CONSTRUCTIONS: Construction[] = [
  {
    maker: "Halvard Coilworks",
    series: "DRS",
    prefix: "HV",
    material: "Ferrite drum, shielded",
    energyDensity: 0.3,
    dcrPerMicrohenry: 5,
    dcrMaxFactor: 1.2,
    isatDrop: 30,
    irmsRise: 40,
    heatFlux: 0.004,
    srfAt1uH: 110,
    priceBase: 0.06,
    pricePerVolume: 0.004,
    sizes: [
      [2.5, 2, 1.2],
      [3, 3, 1.5],
      [4, 4, 2],
      [5, 5, 3],
      [6, 6, 3],
      [8, 8, 4],
      [10, 10, 4.5],
      [12, 12, 6],
    ],
  },
  {
    maker: "Brightfen Magnetics",
    series: "MCX",
    prefix: "BF",
    material: "Metal composite, molded",
    energyDensity: 0.8,
    dcrPerMicrohenry: 6.5,
    dcrMaxFactor: 1.15,
    isatDrop: 20,
    irmsRise: 40,
    heatFlux: 0.0045,
    srfAt1uH: 95,
    priceBase: 0.1,
    pricePerVolume: 0.006,
    sizes: [
      [2.5, 2, 1.2],
      [3, 3, 1.2],
      [4, 4, 2],
      [5, 5, 3],
      [6.5, 6.5, 3],
      [7, 7, 4],
      [10, 10, 5],
      [12, 12, 6],
    ],
  },
  {
    maker: "Quillon Coil Co.",
    series: "PIR",
    prefix: "QC",
    material: "Powdered iron drum, semi-shielded",
    energyDensity: 0.5,
    dcrPerMicrohenry: 7,
    dcrMaxFactor: 1.25,
    isatDrop: 25,
    irmsRise: 30,
    heatFlux: 0.0035,
    srfAt1uH: 80,
    priceBase: 0.04,
    pricePerVolume: 0.003,
    sizes: [
      [5, 5, 3],
      [6, 6, 3.5],
      [7, 7, 3.5],
      [8, 8, 5],
      [10, 10, 5],
      [12, 12, 8],
    ],
  },
];

export interface DemoPart {
  partNumber: string;
  maker: string;
  series: string;
  material: string;
  /** Values as written in demo-parts.csv (text, so variants derive from the same rounded figures). */
  inductanceUh: string;
  tolerancePct: string;
  dcrTypMohm: string;
  dcrMaxMohm: string;
  isatA: string;
  isatDropPct: string;
  irmsA: string;
  irmsRiseK: string;
  srfMhz: string;
  lengthMm: string;
  widthMm: string;
  heightMm: string;
  priceUsd: string;
}

/** Rounds to n significant digits and writes without exponent or trailing zeros. */
function sig(x: number, n: number): string {
  return String(Number(x.toPrecision(n)));
}

function fixed(x: number, decimals: number): string {
  return String(Number(x.toFixed(decimals)));
}

/** 0.33 → "U33", 4.7 → "4U7", 10 → "10U": our own inductance code for part numbers. */
function inductanceCode(uh: number): string {
  const [whole, frac] = String(uh).split(".");
  if (frac === undefined) return `${whole}U`;
  return `${whole === "0" ? "" : whole}U${frac}`;
}

function sizeCode(l: number, h: number): string {
  const two = (x: number) => String(Math.round(x * 10)).padStart(2, "0");
  return `${two(l)}${two(h)}`;
}

export function generateDemoParts(): DemoPart[] {
  const random = makeRandom(20240611);
  const scatter = (spread: number) => 1 + spread * (2 * random() - 1);
  const parts: DemoPart[] = [];
  for (const c of CONSTRUCTIONS) {
    c.sizes.forEach(([l, w, h], sizeIndex) => {
      const volume = l * w * h;
      const s = Math.cbrt(volume);
      const surface = 2 * (l * w + l * h + w * h);
      // Small parts start at the bottom of the series, large ones carry higher inductances.
      const first = Math.min(Math.round((sizeIndex / (c.sizes.length - 1)) * 4), L_SERIES.length - 14);
      for (const uh of L_SERIES.slice(first, first + 14)) {
        const energy = c.energyDensity * volume * 1e-6 * scatter(0.08);
        const isat = Math.sqrt((2 * energy) / (uh * 1e-6));
        const dcr = (c.dcrPerMicrohenry * uh * (4.2 / s) ** 2 + 1.2 * (4.2 / s)) * scatter(0.06);
        const dcrMax = dcr * c.dcrMaxFactor;
        const irms = Math.sqrt((c.heatFlux * surface) / (dcrMax * 1e-3)) * scatter(0.05);
        const srf = c.srfAt1uH * uh ** -0.6 * (4.2 / s) ** 0.3 * scatter(0.1);
        const price = c.priceBase + c.pricePerVolume * volume ** 0.7 * scatter(0.1);
        const tolerance = uh < 1 ? 30 : c.series === "DRS" && uh >= 10 ? 10 : 20;
        parts.push({
          partNumber: `${c.prefix}-${c.series}${sizeCode(l, h)}-${inductanceCode(uh)}`,
          maker: c.maker,
          series: c.series,
          material: c.material,
          inductanceUh: String(uh),
          tolerancePct: String(tolerance),
          dcrTypMohm: sig(dcr, 3),
          dcrMaxMohm: sig(dcrMax, 3),
          isatA: fixed(isat, 2),
          isatDropPct: String(c.isatDrop),
          irmsA: fixed(irms, 2),
          irmsRiseK: String(c.irmsRise),
          srfMhz: sig(srf, 3),
          lengthMm: String(l),
          widthMm: String(w),
          heightMm: String(h),
          priceUsd: fixed(price, 3),
        });
      }
    });
  }
  return parts;
}

const MAIN_HEADER = [
  "Part Number",
  "Maker",
  "Series",
  "Material",
  "Inductance (uH)",
  "Tolerance (%)",
  "DCR typ (mOhm)",
  "DCR max (mOhm)",
  "Isat (A)",
  "Isat drop (%)",
  "Irms (A)",
  "Irms rise (K)",
  "SRF (MHz)",
  "Length (mm)",
  "Width (mm)",
  "Height (mm)",
  "Price (USD)",
];

function csvCell(text: string, delimiter: string): string {
  return text.includes(delimiter) || text.includes('"') || text.includes("\n") ? `"${text.replace(/"/g, '""')}"` : text;
}

function writeRows(rows: string[][], delimiter: string, eol: string): string {
  return rows.map((r) => r.map((c) => csvCell(c, delimiter)).join(delimiter)).join(eol) + eol;
}

export function mainCsv(parts: DemoPart[]): string {
  const rows = parts.map((p) => [
    p.partNumber,
    p.maker,
    p.series,
    p.material,
    p.inductanceUh,
    p.tolerancePct,
    p.dcrTypMohm,
    p.dcrMaxMohm,
    p.isatA,
    p.isatDropPct,
    p.irmsA,
    p.irmsRiseK,
    p.srfMhz,
    p.lengthMm,
    p.widthMm,
    p.heightMm,
    p.priceUsd,
  ]);
  return writeRows([MAIN_HEADER, ...rows], ",", "\n");
}

/** The 60-part subset shared by the variants: every fifth part. */
export function variantSubset(parts: DemoPart[]): DemoPart[] {
  return parts.filter((_, i) => i % 5 === 0).slice(0, 60);
}

/** Moves the decimal point of a decimal text by `shift` places without floating-point rounding. */
function shiftDecimal(text: string, shift: number): string {
  const negative = text.startsWith("-");
  const body = negative ? text.slice(1) : text;
  const [whole = "", frac = ""] = body.split(".");
  let digits = whole + frac;
  let point = whole.length + shift;
  if (point < 0) {
    digits = "0".repeat(-point) + digits;
    point = 0;
  }
  if (point > digits.length) digits += "0".repeat(point - digits.length);
  const intPart = digits.slice(0, point).replace(/^0+(?=\d)/, "") || "0";
  const fracPart = digits.slice(point).replace(/0+$/, "");
  return (negative ? "-" : "") + (fracPart ? `${intPart}.${fracPart}` : intPart);
}

/** mm → inch or mil with 8 significant digits (the variant test allows 1e-6 relative). */
function mmTo(text: string, unit: "in" | "mil"): string {
  const inches = Number(text) / 25.4;
  return sig(unit === "in" ? inches : inches * 1000, 8);
}

/** Tab-separated, title row and a blank line above the header, nH / Ω / mA / kHz, two extra columns. */
export function variantTabbed(parts: DemoPart[]): string {
  const header = [
    "Part No.",
    "Manufacturer",
    "Family",
    "Core",
    "L0 [nH]",
    "Tol. [%]",
    "Rdc typ. [Ω]",
    "Rdc max. [Ω]",
    "I sat [mA]",
    "ΔL at Isat [%]",
    "I rated [mA]",
    "ΔT at I rated [K]",
    "SRF [kHz]",
    "Length [mm]",
    "Width [mm]",
    "Height [mm]",
    "Unit price [USD]",
    "Stock",
    "Packaging",
  ];
  const rows = parts.map((p, i) => [
    p.partNumber,
    p.maker,
    p.series,
    p.material,
    shiftDecimal(p.inductanceUh, 3),
    p.tolerancePct,
    shiftDecimal(p.dcrTypMohm, -3),
    shiftDecimal(p.dcrMaxMohm, -3),
    shiftDecimal(p.isatA, 3),
    p.isatDropPct,
    shiftDecimal(p.irmsA, 3),
    p.irmsRiseK,
    shiftDecimal(p.srfMhz, 3),
    p.lengthMm,
    p.widthMm,
    p.heightMm,
    p.priceUsd,
    String((i * 137) % 5000),
    i % 2 === 0 ? "Tape & reel" : "Cut tape",
  ]);
  return `Tarnwick Distribution\tinductor stock list (invented demo data)\n\n${writeRows([header, ...rows], "\t", "\n")}`;
}

/** 1234.5 → "1.234,5": decimal comma with dots grouping thousands. */
function europeanNumber(text: string): string {
  const [whole = "", frac] = text.split(".");
  const grouped = whole.replace(/\B(?=(\d{3})+(?!\d))/g, ".");
  return frac === undefined ? grouped : `${grouped},${frac}`;
}

/** Semicolons, decimal commas, thousands dots, a unit row under the header, inches, CRLF line ends. */
export function variantSemicolon(parts: DemoPart[]): string {
  const header = [
    "Article",
    "Vendor",
    "Product line",
    "Construction",
    "Inductance",
    "Tolerance",
    "DCR typical",
    "DCR maximum",
    "Saturation current",
    "Saturation drop",
    "Rated current",
    "Temperature rise",
    "Self-resonant frequency",
    "Length",
    "Width",
    "Height",
    "Price",
  ];
  const units = ["", "", "", "", "µH", "%", "mΩ", "mΩ", "A", "%", "A", "K", "kHz", "in", "in", "in", "USD"];
  const rows = parts.map((p) => [
    p.partNumber,
    p.maker,
    p.series,
    p.material,
    europeanNumber(p.inductanceUh),
    `±${p.tolerancePct} %`,
    europeanNumber(p.dcrTypMohm),
    europeanNumber(p.dcrMaxMohm),
    europeanNumber(p.isatA),
    `${p.isatDropPct} %`,
    europeanNumber(p.irmsA),
    p.irmsRiseK,
    europeanNumber(shiftDecimal(p.srfMhz, 3)),
    europeanNumber(mmTo(p.lengthMm, "in")),
    europeanNumber(mmTo(p.widthMm, "in")),
    europeanNumber(mmTo(p.heightMm, "in")),
    europeanNumber(p.priceUsd),
  ]);
  return writeRows([header, units, ...rows], ";", "\r\n");
}

/** 4.7 → "4R7", 0.47 → "R47", 47 → "47R": R marks the decimal point. */
function rNotation(text: string): string {
  const [whole = "", frac] = text.split(".");
  if (frac === undefined) return `${whole}R`;
  return `${whole === "0" ? "" : whole}R${frac}`;
}

/** Comma-separated, R-notation for inductance and DCR, one "L x W x H" column in mil, SI-prefixed SRF. */
export function variantRNotation(parts: DemoPart[]): string {
  const header = [
    "MPN",
    "Make",
    "Series",
    "Core material",
    "Inductance (uH)",
    "L tol",
    "DCR typ (Ohm)",
    "DCR max (Ohm)",
    "Isat (A)",
    "Isat condition",
    "Irms (A)",
    "Irms rise (°C)",
    "SRF (Hz)",
    "L x W x H (mil)",
    "Price",
    "Notes",
  ];
  const rows = parts.map((p, i) => [
    p.partNumber,
    p.maker,
    p.series,
    p.material,
    rNotation(p.inductanceUh),
    `±${p.tolerancePct}%`,
    rNotation(shiftDecimal(p.dcrTypMohm, -3)),
    rNotation(shiftDecimal(p.dcrMaxMohm, -3)),
    `${p.isatA} typ`,
    `${p.isatDropPct}% drop`,
    p.irmsA,
    p.irmsRiseK,
    `${p.srfMhz}M`,
    `${mmTo(p.lengthMm, "mil")} x ${mmTo(p.widthMm, "mil")} x ${mmTo(p.heightMm, "mil")}`,
    `$${p.priceUsd}`,
    i % 7 === 0 ? "preferred, low profile" : "",
  ]);
  return writeRows([header, ...rows], ",", "\n");
}

/**
 * A small list with the problems real lists have, for demos of the rejected-rows view: a title,
 * comments, blank lines, a multi-line quoted note, a duplicate, bad and impossible values, a
 * unit slip and an unrecognised column. Each problem row says in its note what is wrong.
 */
export function messyCsv(parts: DemoPart[]): string {
  const pick = (i: number) => parts[i % parts.length] as DemoPart;
  const row = (p: DemoPart, over: Partial<DemoPart>, note: string) => {
    const q = { ...p, ...over };
    return [q.partNumber, q.maker, q.series, q.material, q.inductanceUh, q.dcrTypMohm, q.dcrMaxMohm, q.isatA, q.irmsA, q.srfMhz, q.lengthMm, q.widthMm, q.heightMm, q.priceUsd, note];
  };
  const header = ["Part Number", "Maker", "Series", "Material", "Inductance (uH)", "DCR typ (mOhm)", "DCR max (mOhm)", "Isat (A)", "Irms (A)", "SRF (MHz)", "Length (mm)", "Width (mm)", "Height (mm)", "Price (USD)", "Notes"];
  const rows = [
    row(pick(100), {}, "fine"),
    row(pick(101), {}, "fine, with a note\non two lines"),
    row(pick(102), { inductanceUh: "" }, "rejected: missing inductance"),
    row(pick(103), { partNumber: "" }, "rejected: missing part number"),
    row(pick(104), { dcrMaxMohm: "about forty" }, "rejected: unparseable DCR"),
    row(pick(105), { isatA: "0" }, "rejected: zero Isat is impossible"),
    row(pick(106), { inductanceUh: "-4.7" }, "rejected: negative inductance"),
    row(pick(107), { inductanceUh: "4700000" }, "kept with a warning: 4.7 H is a unit slip"),
    row(pick(108), { inductanceUh: rNotation(pick(108).inductanceUh), dcrMaxMohm: `${pick(108).dcrMaxMohm} max` }, "fine: R-notation and a qualifier"),
    row(pick(109), { isatA: `${fixed(Number(pick(109).isatA) * 0.9, 2)}-${fixed(Number(pick(109).isatA) * 1.1, 2)}` }, "kept with a note: a range, the lower end is used"),
    row(pick(110), {}, "rejected: replaced by the later row with the same part number"),
    row(pick(110), { priceUsd: "0.21" }, "fine: the later duplicate is kept"),
    row(pick(111), { dcrTypMohm: "60", dcrMaxMohm: "50" }, "kept with a warning: DCR max below typical"),
  ];
  const body = writeRows([header, ...rows.slice(0, 5)], ",", "\n");
  const rest = writeRows(rows.slice(5), ",", "\n");
  return `Invented demo list with typical problems (not real parts)\n\n${body}# a comment line: ignored\n\n${rest}`;
}

function main(): void {
  const parts = generateDemoParts();
  const subset = variantSubset(parts);
  const files: [string, string][] = [
    ["demo-parts.csv", mainCsv(parts)],
    ["demo-variant-tabbed.tsv", variantTabbed(subset)],
    ["demo-variant-semicolon.csv", variantSemicolon(subset)],
    ["demo-variant-rnotation.csv", variantRNotation(subset)],
    ["demo-messy.csv", messyCsv(parts)],
  ];
  for (const [name, text] of files) writeFileSync(join(here, name), text);
  console.log(`${parts.length} parts, ${subset.length} in each variant`);
}

if (process.argv[1] !== undefined && fileURLToPath(import.meta.url) === process.argv[1]) main();
