/** Usage text of the `truss` CLI: every command and its file format. */
export const HELP = `truss — analyse a plane truss, design a roof truss or plan lumber (Spanwise engine)

Usage:
  npm run --silent truss -- analyze FILE.json
  npm run --silent truss -- design FILE.json
  npm run --silent truss -- cut FILE.json
  (FILE may be - to read standard input)

analyze FILE.json — a plane truss in any consistent units:
  {
    "joints":   [{ "id": "A", "x": 0, "y": 0 }, ...],
    "members":  [{ "from": "A", "to": "B", "id"?: "AB", "ea"?: number }, ...],
    "supports": [{ "joint": "A", "type": "pin" | "roller", "normal"?: "x" | "y" }, ...],
    "loads"?:   [{ "joint": "B", "fx"?: number, "fy"?: number }, ...]
  }
  A roller resists along its normal (default y). With "ea" on every member the output has
  joint displacements and an indeterminate truss can be solved.
  Output: { "members": [{ "id", "force" }]  (tension +),
            "reactions": [{ "joint", "rx", "ry" }]  (force on the truss, + along +x/+y),
            "classification": "determinate" | "indeterminate",
            "displacements"?: [{ "joint", "ux", "uy" }], "residual" }

design FILE.json — one roof truss as the sales desk describes it:
  { "units": "imperial" | "metric",           imperial: in and psf; metric: mm and kPa
    "profile": "kingPost" | "queenPost" | "fink" | "howe" | "fan" | "doubleFink" |
               "scissor" | "mono" | "flat",
    "span", "pitch" (rise per 12), "heelHeight"?, "overhang"? (number or { "left", "right" }),
    "spacing"? (24 in / 610 mm), "plies"? (1-4), "bottomPitch"? (scissor), "depth"? and
    "panels"? (flat), "maxStockLength"?, "bearingWidth"? (3.5 in / 89 mm),
    "loads": { "tcll", "tcdl", "bcll", "bcdl", "bcllNonConcurrent"?, "windUplift"?,
               "snow"?: { "pg", "ce"?, "ct"?, "is"?, "slippery"?, "edition"?: "7-16" | "7-22" } },
    "lumber"?: { "topChord"?, "bottomChord"?, "webs"? }   one id ("2x4 SPF-1/2") or a list,
    "deflection"?: { "live"? (240), "total"? (180) }       span / limit,
    "webBraces"?: ["BK", ...],                             webs braced at mid-length
    "bracing"?: { "ceiling"? (true), "bottomChordBracing"? (120 in without a ceiling),
                  "purlinSpacing"? (none: sheathed top chord) } }
  Output: the design in the request's units (see "units" in the output): members with lumber,
  forces per combination and CSI, pieces, reactions, bearing, deflection, plates, additional
  (chord shear, uplift hold-downs, long-term / mid-panel / overhang-tip deflection, scissor
  roller movement), warnings, notes, cautions, engineVersion and "ok".

cut FILE.json — a lumber plan: which stock boards to pull and what to cut from each, at least
  cost. Any one consistent unit for lengths (cost defaults to the stock's length):
  { "stocks": [{ "length", "cost"?, "available"? }, ...],   available = boards on hand
    "kerf"?: 0, "trim"?: 0,                                  kerf between neighbouring pieces,
                                                             trim once per board
    "pieces": [{ "length", "quantity", "id"? }, ...] }
  A board holds its pieces + one kerf between neighbours + the trim.
  Output: { "boards": [{ "stock", "pieces": [lengths], "offcut" }], "boardCount", "totalCost",
            "lowerBound": { "cost" }  (no plan can cost less), "optimal" (cost = bound) }
  A piece longer than every stock (code piece_too_long) or more pieces than the stock on hand
  holds (code not_enough_stock) exits 2.

Errors: exit code 2 and { "error": { "code", "message", "details"? } } on stdout, with code
  invalid | unstable | indeterminate | geometry | no_lumber_passes | no_plate_fits |
  piece_too_long | not_enough_stock.
  Exit code 1 and code "internal" for a fault of the program. Exit code 0 otherwise.
`;
