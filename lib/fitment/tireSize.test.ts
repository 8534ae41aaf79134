import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { TireSizeError } from "./errors";
import { loadIndexKg } from "./loadSpeed";
import { type TireSize, formatTireSize, parseTireSize } from "./tireSize";

describe("parseTireSize — metric (ISO 4000-1 designation)", () => {
  it("LT285/70R17 121/118Q: prefix, construction, dual load index, speed symbol", () => {
    const t = parseTireSize("LT285/70R17 121/118Q");
    expect(t).toMatchObject({
      text: "LT285/70R17 121/118Q",
      system: "metric",
      service: "LT",
      construction: "R",
      sectionWidthMm: 285,
      aspectRatio: 70,
      rimDiameterIn: 17,
      loadIndex: 121,
      dualLoadIndex: 118,
      speedSymbol: "Q",
      loadRange: null,
    });
    // D = d + 2H (ISO 4000-1 / UN R30): 17 × 25.4 + 2 × 285 × 0.70 = 431.8 + 399 = 830.8 mm
    expect(t.overallDiameterMm).toBeCloseTo(830.8, 9);
  });

  it("P225/75R15 102S and 205/55R16 91V", () => {
    expect(parseTireSize("P225/75R15 102S")).toMatchObject({ service: "P", loadIndex: 102, speedSymbol: "S", dualLoadIndex: null });
    expect(parseTireSize("205/55R16 91V")).toMatchObject({ service: null, loadIndex: 91, speedSymbol: "V" });
  });

  it("worked diameters D = d + 2H (ISO 4000-1 / ETRTO / UN R30)", () => {
    expect(parseTireSize("205/55R16").overallDiameterMm).toBeCloseTo(631.9, 9);
    expect(parseTireSize("265/70R17").overallDiameterMm).toBeCloseTo(802.8, 9);
    expect(parseTireSize("315/70R17").overallDiameterMm).toBeCloseTo(872.8, 9);
  });

  it("case and spacing variants normalize to one text", () => {
    for (const v of ["lt285/70r17 121/118q", "LT 285/70 R17 121/118Q", "  LT285 / 70 R 17   121/118Q ", "285/70R17LT 121/118Q"]) {
      expect(parseTireSize(v).text).toBe("LT285/70R17 121/118Q");
    }
  });

  it("constructions R, D, B, - and ZR", () => {
    expect(parseTireSize("225/75D15").construction).toBe("D");
    expect(parseTireSize("225/75B15").construction).toBe("B");
    expect(parseTireSize("225/75-15").construction).toBe("-");
    const zr = parseTireSize("255/35ZR18 94Y");
    expect(zr).toMatchObject({ construction: "R", speedRatedConstruction: true, speedSymbol: "Y", text: "255/35ZR18 94Y" });
    expect(parseTireSize("255/35ZR18 (94Y)")).toMatchObject({ serviceDescriptionBracketed: true, text: "255/35ZR18 (94Y)" }); // (Y): above 300 km/h (UN R30)
    expect(() => parseTireSize("255/35ZR18 (94Y")).toThrow(TireSizeError);
    expect(parseTireSize("T125/70D16").service).toBe("T");
    expect(parseTireSize("ST225/75R15").service).toBe("ST");
  });
});

describe("parseTireSize — flotation and numeric", () => {
  it("37x12.50R17LT: D 37 in = 939.8 mm, section 12.50 in, implied aspect (37−17)/2/12.5 = 80", () => {
    const t = parseTireSize("37x12.50R17LT");
    expect(t).toMatchObject({ system: "flotation", service: "LT", construction: "R", rimDiameterIn: 17, aspectRatioImplied: true });
    expect(t.overallDiameterMm).toBeCloseTo(939.8, 9); // 37 × 25.4 (NIST SP 811 inch)
    expect(t.sectionWidthMm).toBeCloseTo(317.5, 9);
    expect(t.aspectRatio).toBeCloseTo(80, 9);
  });

  it("35X12.50R15 and 35x12.5r15 normalize to 35x12.50R15", () => {
    expect(parseTireSize("35X12.50R15").text).toBe("35x12.50R15");
    expect(parseTireSize("35 x 12.5 r 15").text).toBe("35x12.50R15");
    expect(parseTireSize("35X12.50R15").service).toBeNull();
  });

  it("× (U+00D7), X and the lookalikes people paste read as the flotation x and normalize to one text", () => {
    // The designation is DxW R d (TRA flotation); what joins D and W is only a separator, so the
    // multiplication sign a typeface or word processor puts there, upper-case X, the fullwidth
    // forms an East Asian input method types (Unicode NFKC folds them, digits included), and the
    // ✕/⨯ signs and the Cyrillic х that look the same all mean the same size (common practice, no source).
    const variants = [
      "37×12.50R17",
      "37 × 12.50 R17",
      "37X12.50R17",
      "37ｘ12.50R17", // U+FF58 fullwidth x
      "37Ｘ12.50R17", // U+FF38 fullwidth X
      "３７ｘ１２．５０Ｒ１７", // fullwidth digits, full stop and R
      "37✕12.50R17", // U+2715 multiplication x
      "37⨯12.50R17", // U+2A2F vector or cross product
      "37х12.50R17", // U+0445 Cyrillic small ha
      "37Х12.50R17", // U+0425 Cyrillic capital ha
      "37\u00a0x\u00a012.50R17", // no-break spaces from a pasted web page
      "37 x 12.50 R17\u202f", // narrow no-break space at the end
    ];
    for (const v of variants) {
      const t = parseTireSize(v);
      expect(t.text, v).toBe("37x12.50R17");
      expect(t.overallDiameterMm, v).toBeCloseTo(939.8, 9); // 37 × 25.4 mm (NIST SP 811 inch)
    }
    expect(parseTireSize("37×12.50R17LT 121Q LRE").text).toBe("37x12.50R17LT 121Q LRE");
  });

  it("fullwidth slash and lookalike dashes in metric and numeric sizes (NFKC, common practice, no source)", () => {
    expect(parseTireSize("LT２８５／７５Ｒ１６").text).toBe("LT285/75R16");
    expect(parseTireSize("285∕75R16").text).toBe("285/75R16"); // U+2215 division slash
    expect(parseTireSize("7.50\u201116").text).toBe("7.50-16"); // U+2011 non-breaking hyphen
    expect(parseTireSize("7.50\u201316").text).toBe("7.50-16"); // U+2013 en dash
    expect(parseTireSize("7.50\u221216").text).toBe("7.50-16"); // U+2212 minus sign
  });

  it("a lookalike that is not a separator is still refused with the field's message", () => {
    expect(() => parseTireSize("37÷12.50R17")).toThrow(TireSizeError);
    expect(() => parseTireSize("37*12.50R17")).toThrow(/Tire size/);
  });

  it("numeric 7.50R16 and 7.50-16: section 7.50 in, nominal 92 series (from memory)", () => {
    const r = parseTireSize("7.50R16");
    expect(r).toMatchObject({ system: "numeric", construction: "R", rimDiameterIn: 16, aspectRatio: 92, aspectRatioImplied: true });
    expect(r.sectionWidthMm).toBeCloseTo(190.5, 9);
    expect(r.overallDiameterMm).toBeCloseTo(406.4 + 2 * 190.5 * 0.92, 9);
    expect(parseTireSize("7.50-16").construction).toBe("-");
    expect(parseTireSize("7.50r16lt").service).toBe("LT");
  });
});

describe("parseTireSize — what people copy from a sidewall", () => {
  // The markings that follow the service description: mud-and-snow (M+S), the severe-snow
  // pictogram (three-peak mountain snowflake), extra load / reinforced, run-flat, load range
  // (UN R30 / ECE R117 markings and TRA load range letters; spellings people type are common
  // practice, no source).
  it("mud-and-snow: M+S, M/S, M&S, MS and 'mud and snow' all read as M+S", () => {
    for (const v of ["M+S", "M/S", "M&S", "m+s", "MS", "Mud and Snow", "M + S"]) {
      const t = parseTireSize(`LT285/70R17 121/118Q ${v}`);
      expect(t.markings, v).toEqual(["M+S"]);
      expect(t.text, v).toBe("LT285/70R17 121/118Q M+S");
    }
  });

  it("severe-snow mark: 3PMSF, 3PMS, the words spelled out and the snowflake sign read as 3PMSF", () => {
    for (const v of [
      "3PMSF",
      "3pms",
      "3 Peak Mountain Snowflake",
      "three-peak mountain snowflake",
      "Three Peak Mountain Snow Flake",
      "mountain snowflake",
      "severe snow",
      "\u2744",
    ]) {
      expect(parseTireSize(`265/70R17 115T ${v}`).markings, v).toEqual(["3PMSF"]);
    }
  });

  it.each<[string, keyof TireSize, string]>([
    // Load range and XL markings after the service description.
    ["LT285/70R17 121/118Q E", "loadRange", "E"],
    ["LT285/70R17 121/118Q LRE", "loadRange", "E"],
    ["LT285/70R17 121/118Q Load Range E", "text", "LT285/70R17 121/118Q LRE"],
    ["LT285/70R17 10PR", "loadRange", "E"],
    ["LT285/70R17 121/118Q 10 PLY", "loadRange", "E"],
    ["225/45R17 94W XL", "loadMarking", "XL"],
    // Extra load and reinforced spelled out read as XL and RF; standard load as SL.
    ["225/45R17 94W Extra Load", "loadMarking", "XL"],
    ["225/45R17 94W Reinforced", "loadMarking", "RF"],
    ["225/45R17 94W reinf", "loadMarking", "RF"],
    ["225/45R17 91W Standard Load", "loadMarking", "SL"],
    ["225/45R17 94W Extra Load", "text", "225/45R17 94W XL"],
  ])("load marking: %s reads with %s %s", (text, field, value) => {
    expect(parseTireSize(text)[field]).toBe(value);
  });

  it("run-flat: RFT, run-flat, runflat, run flat, ROF and ZP read as RUN-FLAT", () => {
    for (const v of ["RFT", "run-flat", "RunFlat", "run flat", "ROF", "ZP"]) {
      const t = parseTireSize(`225/45R17 91W ${v}`);
      expect(t.markings, v).toEqual(["RUN-FLAT"]);
      expect(t.text, v).toBe("225/45R17 91W RUN-FLAT");
    }
  });

  it("load range as LRE, LR E, LR-E, Load Range E, (E), E or 10PR, in any place after the size", () => {
    for (const v of ["LRE", "LR E", "LR-E", "Load Range E", "(E)", "E", "10PR", "10 ply"]) {
      expect(parseTireSize(`LT265/75R16 123/120S ${v}`).loadRange, v).toBe("E");
      expect(parseTireSize(`LT265/75R16 ${v} 123/120S`).loadRange, v).toBe("E");
    }
    expect(parseTireSize("LT265/75R16 LRE 123/120S").text).toBe("LT265/75R16 123/120S LRE");
  });

  it("several markings in any order normalize to one text: service description, load marking, load range, then M+S, 3PMSF, RUN-FLAT", () => {
    const a = parseTireSize("LT285/70R17 M+S 3PMSF 121/118Q Load Range E");
    const b = parseTireSize("lt285/70r17 121/118q lre 3pmsf m/s");
    expect(a.text).toBe("LT285/70R17 121/118Q LRE M+S 3PMSF");
    expect(b).toEqual(a);
    expect(a).toMatchObject({ loadIndex: 121, dualLoadIndex: 118, speedSymbol: "Q", loadRange: "E", markings: ["M+S", "3PMSF"] });
    const xl = parseTireSize("245/45R19 102V XL RFT M+S");
    expect(xl).toMatchObject({ loadMarking: "XL", markings: ["M+S", "RUN-FLAT"], text: "245/45R19 102V XL M+S RUN-FLAT" });
  });

  it("a repeated marking is read once; a contradicting one is refused with the accepted forms", () => {
    expect(parseTireSize("265/70R17 115T M+S M/S").markings).toEqual(["M+S"]);
    expect(() => parseTireSize("225/45R17 94W XL SL")).toThrow(TireSizeError);
    expect(() => parseTireSize("LT285/70R17 LRE LRD")).toThrow(/load range given twice.*265\/70R17/);
    expect(() => parseTireSize("LT285/70R17 121/118Q 121/118Q")).toThrow(/service description given twice/);
    expect(() => parseTireSize("265/70R17 115T snow")).toThrow(/unexpected "SNOW".*M\+S/);
  });

  it("ETRTO commercial size with the C suffix and its dual load index: 235/65R16C 121/119R → single 121 (1450 kg), dual 119 (1360 kg) (ISO 4000-1 table)", () => {
    const t = parseTireSize("235/65R16C 121/119R");
    expect(t).toMatchObject({
      system: "metric",
      service: null,
      commercial: true,
      sectionWidthMm: 235,
      aspectRatio: 65,
      rimDiameterIn: 16,
      loadIndex: 121,
      dualLoadIndex: 119,
      speedSymbol: "R",
      text: "235/65R16C 121/119R",
    });
    // D = d + 2H (ISO 4000-1): 16 × 25.4 + 2 × 235 × 0.65 = 406.4 + 305.5 = 711.9 mm
    expect(t.overallDiameterMm).toBeCloseTo(711.9, 9);
    expect(loadIndexKg(t.loadIndex ?? -1)).toBe(1450); // single fitment (ISO 4000-1 table)
    expect(loadIndexKg(t.dualLoadIndex ?? -1)).toBe(1360); // dual fitment (ISO 4000-1 table)
    expect(parseTireSize("235/65 r16c 121/119r 8PR").loadRange).toBe("D");
    expect(parseTireSize("7.50R16C 116/114N")).toMatchObject({ system: "numeric", commercial: true, text: "7.50R16C 116/114N" });
    expect(parseTireSize("265/70R17").commercial).toBe(false);
  });

  it("a C after a space is still the load range C (as before); C with an LT or P prefix is refused", () => {
    expect(parseTireSize("LT225/75R16 C")).toMatchObject({ commercial: false, loadRange: "C" });
    expect(() => parseTireSize("LT235/65R16C")).toThrow(/service type given twice/);
    expect(() => parseTireSize("P235/65R16C")).toThrow(TireSizeError);
  });

  it("flotation sizes typed without the decimal point: 35x1250R17 → 35x12.50R17, 33X1250R15LT → 33x12.50R15LT, 31x1050R15 → 31x10.50R15", () => {
    expect(parseTireSize("35x1250R17").text).toBe("35x12.50R17");
    expect(parseTireSize("33X1250R15LT").text).toBe("33x12.50R15LT");
    expect(parseTireSize("31x1050R15 109Q LRC").text).toBe("31x10.50R15 109Q LRC");
    expect(parseTireSize("37x1250r17lt")).toEqual(parseTireSize("37x12.50R17LT"));
    // 12.50 in = 317.5 mm (NIST SP 811 inch)
    expect(parseTireSize("35x1250R17").sectionWidthMm).toBeCloseTo(317.5, 9);
    expect(() => parseTireSize("35x125R17")).toThrow(/section width 1.25 in/);
  });

  it("three numbers between slashes are refused with the metric size they most likely mean (common practice, no source)", () => {
    // Metric designation width/aspect, construction letter, rim (ISO 4000-1): 285/70/17 has a slash for the R.
    expect(() => parseTireSize("285/70/17")).toThrow(
      /^Tire size "285\/70\/17": not a recognised tire size designation; did you mean 285\/70R17\? \(accepted forms:/,
    );
    expect(() => parseTireSize("lt 285/70/17 121/118q")).toThrow(/did you mean LT285\/70R17 121\/118Q\?/);
    // No suggestion that would itself be refused (rim 40 in is outside 8–30 in) or for other slips.
    expect(() => parseTireSize("285/70/40")).toThrow(/not a recognised tire size designation \(accepted forms/);
    expect(() => parseTireSize("285-70-17")).not.toThrow(/did you mean/);
    // The reason alone, for a screen that names the field itself.
    const refused = (() => {
      try {
        parseTireSize("285/70/17");
      } catch (e) {
        return e as TireSizeError;
      }
    })();
    expect(refused?.reason).toMatch(/^not a recognised tire size designation; did you mean 285\/70R17\? \(accepted forms: 265\/70R17/);
    expect(refused?.message).toBe(`Tire size "285/70/17": ${refused?.reason}`);
  });
});

describe("parseTireSize — invalid input", () => {
  const bad = [
    "",
    "abc",
    "265/70",
    "265/7R17",
    "265/70R",
    "265/70R17 999Q",
    "265/70R17 121X",
    "20x12.50R17",
    "265/70R40",
    "37x12.50R17LT extra words",
    "LT265/70R17LT",
  ];
  for (const text of bad) {
    it(`rejects ${JSON.stringify(text)} with a TireSizeError that shows an accepted example`, () => {
      expect(() => parseTireSize(text)).toThrow(TireSizeError);
      expect(() => parseTireSize(text)).toThrow(/265\/70R17/);
    });
  }
  it("TireSizeError is a subclass of Error", () => {
    try {
      parseTireSize("nope");
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(Error);
      expect(e).toBeInstanceOf(TireSizeError);
    }
  });
  it("non-string input throws TireSizeError too", () => {
    expect(() => parseTireSize(undefined as unknown as string)).toThrow(TireSizeError);
    expect(() => parseTireSize(42 as unknown as string)).toThrow(TireSizeError);
  });
});

describe("parseTireSize — properties (fast-check)", () => {
  it("throws nothing but TireSizeError on arbitrary strings", () => {
    fc.assert(
      fc.property(fc.string({ maxLength: 60 }), (s) => {
        try {
          parseTireSize(s);
        } catch (e) {
          if (!(e instanceof TireSizeError)) throw e;
        }
      }),
      { numRuns: 3000 },
    );
  });

  it("throws nothing but TireSizeError on strings made of tire-size characters", () => {
    const chars = fc.constantFrom(..."0123456789/xXRrDdBbLTPSZ .-()QEHVWY".split(""));
    fc.assert(
      fc.property(
        fc.array(chars, { maxLength: 30 }).map((a) => a.join("")),
        (s) => {
          try {
            const t = parseTireSize(s);
            expect(Number.isFinite(t.overallDiameterMm)).toBe(true);
          } catch (e) {
            if (!(e instanceof TireSizeError)) throw e;
          }
        },
      ),
      { numRuns: 3000 },
    );
  });

  const metric = fc
    .record({
      prefix: fc.constantFrom("", "P", "LT", "ST", "T"),
      width: fc.integer({ min: 10, max: 49 }).map((n) => n * 10 + 5),
      aspect: fc.integer({ min: 4, max: 20 }).map((n) => n * 5),
      cons: fc.constantFrom("R", "D", "B", "ZR"),
      rim: fc.constantFrom(13, 14, 15, 16, 16.5, 17, 18, 19.5, 20, 22, 24),
      li: fc.option(fc.integer({ min: 0, max: 150 })),
      dual: fc.option(fc.integer({ min: 0, max: 150 })),
      speed: fc.option(fc.constantFrom("A8", "B", "J", "Q", "R", "S", "T", "H", "V", "W", "Y")),
      lr: fc.option(fc.constantFrom("C", "D", "E", "F")),
      bracket: fc.boolean(),
      commercial: fc.boolean(),
      marks: fc.subarray(["M+S", "3PMSF", "RFT", "XL"]),
    })
    .map((r) => {
      const inner = `${r.li}${r.dual === null ? "" : `/${r.dual}`}${r.speed ?? ""}`;
      const sd = r.li === null ? "" : ` ${r.bracket ? `(${inner})` : inner}`;
      const c = r.commercial && r.prefix === "" ? "C" : "";
      const marks = r.marks.length === 0 ? "" : ` ${r.marks.join(" ")}`;
      return `${r.prefix}${r.width}/${r.aspect}${r.cons}${r.rim}${c}${sd}${r.lr === null ? "" : ` LR${r.lr}`}${marks}`;
    });
  const flotation = fc
    .record({
      d: fc.integer({ min: 28, max: 44 }),
      s: fc.constantFrom(9.5, 10.5, 11.5, 12.5, 13.5, 14.5, 15.5),
      rim: fc.constantFrom(15, 16, 17, 18, 20),
      lt: fc.boolean(),
    })
    .filter((r) => ((r.d - r.rim) / 2 / r.s) * 100 >= 20 && ((r.d - r.rim) / 2 / r.s) * 100 <= 120)
    .map((r) => `${r.d}x${r.s.toFixed(2)}R${r.rim}${r.lt ? "LT" : ""}`);

  it("format/parse round-trips: parse(format(t)) equals t and format is the normalized text", () => {
    fc.assert(
      fc.property(fc.oneof(metric, flotation), (text) => {
        const t = parseTireSize(text);
        expect(formatTireSize(t)).toBe(t.text);
        expect(parseTireSize(formatTireSize(t))).toEqual(t);
        expect(parseTireSize(text.toLowerCase())).toEqual(t);
      }),
      { numRuns: 2000 },
    );
  });
});
