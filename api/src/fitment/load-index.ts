/**
 * Load index → load capacity per tyre, kg.
 *
 * 90–130: ISO 4000-1 / ETRTO load index table, as listed in REFERENCES.md (confidence H).
 * 60–89 and 131–150: from memory of the same table (not verified against the standard's text);
 * they follow the table's geometric progression of about 2.9 % per step and are kept because
 * small cars (below 90) and heavy light-truck tyres (above 130) carry them.
 */

const LOAD_INDEX_KG_ENTRIES: ReadonlyArray<readonly [number, number]> = [
  // From memory: ISO 4000-1 / ETRTO load index table, indices 60–89.
  [60, 250],
  [61, 257],
  [62, 265],
  [63, 272],
  [64, 280],
  [65, 290],
  [66, 300],
  [67, 307],
  [68, 315],
  [69, 325],
  [70, 335],
  [71, 345],
  [72, 355],
  [73, 365],
  [74, 375],
  [75, 387],
  [76, 400],
  [77, 412],
  [78, 425],
  [79, 437],
  [80, 450],
  [81, 462],
  [82, 475],
  [83, 487],
  [84, 500],
  [85, 515],
  [86, 530],
  [87, 545],
  [88, 560],
  [89, 580],
  // Source: ISO 4000-1 / ETRTO load index table (REFERENCES.md, H), indices 90–130.
  [90, 600],
  [91, 615],
  [92, 630],
  [93, 650],
  [94, 670],
  [95, 690],
  [96, 710],
  [97, 730],
  [98, 750],
  [99, 775],
  [100, 800],
  [101, 825],
  [102, 850],
  [103, 875],
  [104, 900],
  [105, 925],
  [106, 950],
  [107, 975],
  [108, 1000],
  [109, 1030],
  [110, 1060],
  [111, 1090],
  [112, 1120],
  [113, 1150],
  [114, 1180],
  [115, 1215],
  [116, 1250],
  [117, 1285],
  [118, 1320],
  [119, 1360],
  [120, 1400],
  [121, 1450],
  [122, 1500],
  [123, 1550],
  [124, 1600],
  [125, 1650],
  [126, 1700],
  [127, 1750],
  [128, 1800],
  [129, 1850],
  [130, 1900],
  // From memory: ISO 4000-1 / ETRTO load index table, indices 131–150.
  [131, 1950],
  [132, 2000],
  [133, 2060],
  [134, 2120],
  [135, 2180],
  [136, 2240],
  [137, 2300],
  [138, 2360],
  [139, 2430],
  [140, 2500],
  [141, 2575],
  [142, 2650],
  [143, 2725],
  [144, 2800],
  [145, 2900],
  [146, 3000],
  [147, 3075],
  [148, 3150],
  [149, 3250],
  [150, 3350],
];

/** Load capacity per tyre in kg, keyed by load index. */
export const LOAD_INDEX_KG: ReadonlyMap<number, number> = new Map(LOAD_INDEX_KG_ENTRIES);

export const LOWEST_LOAD_INDEX = LOAD_INDEX_KG_ENTRIES[0][0];
export const HIGHEST_LOAD_INDEX = LOAD_INDEX_KG_ENTRIES[LOAD_INDEX_KG_ENTRIES.length - 1][0];

/** True when Liftwright's table holds this load index. */
export function isKnownLoadIndex(loadIndex: number): boolean {
  return LOAD_INDEX_KG.has(loadIndex);
}

/** Load capacity per tyre, kg, for a load index; null when the table does not hold it. */
export function loadIndexKg(loadIndex: number): number | null {
  return LOAD_INDEX_KG.get(loadIndex) ?? null;
}

export interface TyreLoadCapacityKg {
  /** Capacity per tyre, kg, when the tyre runs on its own at an axle end (first index). */
  singleKg: number;
  /** Capacity per tyre, kg, when two tyres run side by side (second index of an LT mark such as 121/118); null when not marked. */
  dualKg: number | null;
}

/**
 * Capacity of a tyre marked with a single index (e.g. 115) or an LT dual mark (e.g. 121/118:
 * 1450 kg single, 1320 kg each in dual fitment). Null when an index is not in the table.
 */
export function tyreLoadCapacityKg(
  loadIndexSingle: number,
  loadIndexDual: number | null,
): TyreLoadCapacityKg | null {
  const singleKg = loadIndexKg(loadIndexSingle);
  if (singleKg === null) return null;
  if (loadIndexDual === null) return { singleKg, dualKg: null };
  const dualKg = loadIndexKg(loadIndexDual);
  if (dualKg === null) return null;
  return { singleKg, dualKg };
}

/** The lowest load index whose capacity is at least `loadKg`, or null when none is enough. */
export function lowestLoadIndexFor(loadKg: number): number | null {
  const found = LOAD_INDEX_KG_ENTRIES.find(([, kg]) => kg >= loadKg);
  return found ? found[0] : null;
}
