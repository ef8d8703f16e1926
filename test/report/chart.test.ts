import { describe, it, expect } from "vitest";
import fc from "fast-check";
import {
  barChart,
  CHART_PALETTE,
  escapeXml,
  formatChartNumber,
  lineChart,
  linearTicks,
  logTicks,
} from "../../src/report/chart.js";
import { allText, findAll, parseXml } from "../cli/xml.js";

const seriesPaths = (svg: string) => findAll(parseXml(svg), "path").filter((p) => p.attributes.class === "series");

describe("lineChart", () => {
  const basic = lineChart({
    title: "Coil impedance",
    xLabel: "frequency",
    yLabel: "|Z|",
    xUnit: "Hz",
    yUnit: "Ω",
    xLog: true,
    yLog: true,
    series: [
      { name: "empty coil", x: [1e3, 1e4, 1e5, 1e6], y: [0.01, 0.1, 1, 10] },
      { name: "with part <steel & ring>", x: [1e3, 1e4, 1e5, 1e6], y: [0.02, 0.3, 2, 9] },
    ],
  });

  it("produces a well-formed SVG document with one path per series", () => {
    const root = parseXml(basic);
    expect(root.name).toBe("svg");
    expect(root.attributes.xmlns).toBe("http://www.w3.org/2000/svg");
    expect(seriesPaths(basic)).toHaveLength(2);
    for (const p of seriesPaths(basic)) expect(p.attributes.d).toMatch(/^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+)+$/);
  });

  it("escapes text that would break the markup", () => {
    expect(basic).toContain("with part &lt;steel &amp; ring&gt;");
  });

  it("labels log-axis decades with SI prefixes and the unit", () => {
    const text = allText(parseXml(basic));
    for (const label of ["1 kHz", "10 kHz", "100 kHz", "1 MHz", "10 mΩ", "100 mΩ", "1 Ω", "10 Ω"]) expect(text).toContain(label);
    expect(text).toContain("frequency [Hz]");
  });

  it("gives every series a distinct colour and dash pattern, and shows the legend", () => {
    const paths = seriesPaths(basic);
    expect(paths[0]?.attributes.stroke).not.toBe(paths[1]?.attributes.stroke);
    expect(paths[0]?.attributes["stroke-dasharray"]).not.toBe(paths[1]?.attributes["stroke-dasharray"]);
    const legend = findAll(parseXml(basic), "g").find((g) => g.attributes.class === "legend");
    expect(legend && allText(legend)).toContain("empty coil");
  });

  it("draws empty axes with a note when there is no data", () => {
    for (const series of [[], [{ name: "nothing", x: [], y: [] }], [{ name: "nan", x: [Number.NaN], y: [1] }]]) {
      const svg = lineChart({ title: "empty", xLabel: "x", yLabel: "y", series, xLog: true, yLog: true });
      const root = parseXml(svg);
      expect(allText(root)).toContain("no data");
      expect(seriesPaths(svg)).toHaveLength(0);
    }
  });

  it("handles a single point and a constant series without NaN", () => {
    for (const series of [[{ name: "one", x: [5], y: [3] }], [{ name: "flat", x: [0, 1, 2], y: [7, 7, 7] }], [{ name: "zero", x: [0, 0], y: [0, 0] }]]) {
      const svg = lineChart({ title: "degenerate", xLabel: "x", yLabel: "y", series });
      parseXml(svg);
      expect(svg).not.toMatch(/NaN|Infinity/);
      expect(seriesPaths(svg)).toHaveLength(1);
    }
  });

  it("breaks the line at non-finite points and at non-positive values on a log axis", () => {
    const svg = lineChart({
      title: "gaps",
      xLabel: "x",
      yLabel: "y",
      yLog: true,
      series: [{ name: "s", x: [1, 2, 3, 4, 5, 6], y: [1, 2, Number.NaN, 4, -1, 6] }],
    });
    const d = seriesPaths(svg)[0]?.attributes.d ?? "";
    expect(d.match(/M/g)).toHaveLength(3);
    expect(svg).not.toMatch(/NaN|Infinity/);
  });

  it("draws a secondary axis and reference lines", () => {
    const svg = lineChart({
      title: "Heat-up",
      xLabel: "time",
      yLabel: "temperature",
      xUnit: "s",
      yUnit: "°C",
      series: [
        { name: "part temperature", x: [0, 10, 20, 30], y: [20, 400, 760, 800] },
        { name: "frequency", x: [0, 10, 20, 30], y: [20e3, 19e3, 24e3, 25e3], axis: "secondary" },
      ],
      secondaryAxis: { label: "frequency", unit: "Hz" },
      referenceLines: [{ axis: "y", value: 770, label: "Curie point" }, { axis: "x", value: 15, label: "t" }],
    });
    const text = allText(parseXml(svg));
    expect(text).toContain("frequency (right axis)");
    expect(text).toContain("20 kHz");
    expect(text).toContain("Curie point");
    expect(findAll(parseXml(svg), "line").filter((l) => l.attributes.class === "reference")).toHaveLength(2);
  });

  it("gives two charts on one page different clip-path ids", () => {
    const a = lineChart({ title: "A", xLabel: "x", yLabel: "y", series: [{ name: "s", x: [0, 1], y: [0, 1] }] });
    const b = lineChart({ title: "B", xLabel: "x", yLabel: "y", series: [{ name: "s", x: [0, 1], y: [0, 1] }] });
    const id = (svg: string) => findAll(parseXml(svg), "clipPath")[0]?.attributes.id;
    expect(id(a)).not.toBe(id(b));
  });

  it("never emits NaN or Infinity and always parses, for arbitrary finite data (property)", () => {
    const value = fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e12, max: 1e12 });
    fc.assert(
      fc.property(fc.array(fc.tuple(value, value), { maxLength: 30 }), fc.boolean(), fc.boolean(), (points, xLog, yLog) => {
        const svg = lineChart({
          title: "p",
          xLabel: "x",
          yLabel: "y",
          xLog,
          yLog,
          series: [{ name: "s", x: points.map((p) => p[0]), y: points.map((p) => p[1]) }],
        });
        parseXml(svg);
        return !/NaN|Infinity/.test(svg);
      }),
      { seed: 1, numRuns: 200 },
    );
  });
});

describe("ticks", () => {
  it("linear ticks step by 1, 2 or 5 times a power of ten and cover the range", () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.double({ min: 1e-6, max: 1e9, noNaN: true }), (lo, span) => {
        const { ticks, min, max } = linearTicks(lo, lo + span);
        const step = (ticks[1]?.value ?? 0) - (ticks[0]?.value ?? 0);
        const mantissa = step / 10 ** Math.floor(Math.log10(step) + 1e-9);
        return min <= lo + span * 1e-8 && max >= lo + span * (1 - 1e-8) && ticks.length >= 2 && ticks.length <= 12 && [1, 2, 5, 10].some((m) => Math.abs(mantissa - m) < 1e-6);
      }),
      { seed: 1, numRuns: 200 },
    );
  });

  it("linear tick labels are distinct", () => {
    const { ticks } = linearTicks(0.1, 0.13, "V");
    const labels = ticks.map((t) => t.label);
    expect(new Set(labels).size).toBe(labels.length);
    expect(labels).toContain("105 mV");
  });

  it("log ticks label every decade across wide ranges and add 2 and 5 across narrow ones", () => {
    const wide = logTicks(3e2, 4e6, "Hz");
    expect(wide.min).toBe(100);
    expect(wide.max).toBe(1e7);
    expect(wide.ticks.filter((t) => t.major).map((t) => t.label)).toEqual(["100 Hz", "1 kHz", "10 kHz", "100 kHz", "1 MHz", "10 MHz"]);
    const narrow = logTicks(1.5e4, 4e4, "Hz");
    expect(narrow.ticks.filter((t) => t.major).map((t) => t.label)).toEqual(["10 kHz", "20 kHz", "50 kHz"]);
  });

  it("log ticks keep a sub-three-decade data range when two labelled ticks fit inside it", () => {
    const t = logTicks(1.06e4, 1.07e5, "Hz");
    expect(t.min).toBe(1.06e4);
    expect(t.max).toBe(1.07e5);
    expect(t.ticks.filter((x) => x.major).map((x) => x.label)).toEqual(["20 kHz", "50 kHz", "100 kHz"]);
  });

  it("formats numbers with engineering prefixes", () => {
    expect(formatChartNumber(4.7e-6, "F")).toBe("4.7 µF");
    expect(formatChartNumber(1500, "W")).toBe("1.5 kW");
    expect(formatChartNumber(0, "A")).toBe("0 A");
    expect(formatChartNumber(850, "°C")).toBe("850 °C");
    expect(formatChartNumber(-0.25, "")).toBe("-0.25");
    expect(escapeXml(`a<b>&"c'`)).toBe("a&lt;b&gt;&amp;&quot;c&#39;");
  });

  it("the palette has at least six distinct colours", () => {
    expect(new Set(CHART_PALETTE).size).toBeGreaterThanOrEqual(6);
  });
});

describe("barChart", () => {
  it("draws one labelled bar per category with values and shares", () => {
    const svg = barChart({
      title: "Losses by place",
      valueLabel: "power",
      unit: "W",
      showShare: true,
      bars: [
        { label: "part", value: 1500 },
        { label: "coil copper", value: 300 },
        { label: "capacitors", value: 20 },
        { label: "switches", value: 180 },
      ],
    });
    const root = parseXml(svg);
    expect(findAll(root, "rect").filter((r) => r.attributes.class === "bar")).toHaveLength(4);
    const text = allText(root);
    expect(text).toContain("1.5 kW (75 %)");
    expect(text).toContain("coil copper");
  });

  it("copes with no bars, zero and non-finite values", () => {
    for (const bars of [[], [{ label: "a", value: 0 }], [{ label: "b", value: Number.NaN }, { label: "c", value: -3 }]]) {
      const svg = barChart({ title: "t", valueLabel: "v", bars });
      parseXml(svg);
      expect(svg).not.toMatch(/NaN|Infinity/);
    }
  });
});
