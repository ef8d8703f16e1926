import { describe, it, expect } from "vitest";
import { solveOde, InputError } from "../../src/index.js";

// Outside references: the closed-form solutions of linear ODEs (exponential decay
// y = y0 e^{-kt}; harmonic oscillator x = cos ωt, v = −ω sin ωt), standard calculus.

describe("solveOde: exponential decay y' = -k y (closed form y0 e^{-kt})", () => {
  const k = 1.3;
  const decay = (_t: number, y: Float64Array, dy: Float64Array): void => {
    dy[0] = -k * y[0]!;
  };

  it("reaches the closed form at t = 10 within 1e-12 absolute at rtol 1e-10", () => {
    const r = solveOde(decay, [1], { end: 10, relativeTolerance: 1e-10, absoluteTolerance: 1e-12 });
    expect(r.status).toBe("completed");
    expect(r.finalTime).toBe(10);
    // closed form e^{-13}
    expect(Math.abs(r.finalState[0]! - Math.exp(-13))).toBeLessThan(1e-12);
  });

  it("every recorded step agrees with the closed form within 1e-8 relative at rtol 1e-10", () => {
    const r = solveOde(decay, [2], { end: 10, relativeTolerance: 1e-10, absoluteTolerance: 1e-14 });
    expect(r.times[0]).toBe(0);
    expect(r.times.length).toBe(r.acceptedSteps + 1);
    for (let i = 0; i < r.times.length; i++) {
      const exact = 2 * Math.exp(-k * r.times[i]!); // closed form
      expect(Math.abs(r.states[i]![0]! / exact - 1)).toBeLessThan(1e-8);
    }
  });

  it("dense output between steps agrees with the closed form within 1e-7 at rtol 1e-8", () => {
    const r = solveOde(decay, [1], { end: 10, relativeTolerance: 1e-8, absoluteTolerance: 1e-10, dense: true });
    let worst = 0;
    for (let t = 0; t <= 10; t += 0.0137) worst = Math.max(worst, Math.abs(r.sample!(t)[0]! - Math.exp(-k * t)));
    expect(worst).toBeLessThan(1e-7);
  });

  it("dense output is of order 4: at rtol 1e-6 its error stays within 5x the step-end error", () => {
    const r = solveOde(decay, [1], { end: 10, relativeTolerance: 1e-6, absoluteTolerance: 1e-9, dense: true });
    let worstDense = 0;
    for (let t = 0; t <= 10; t += 0.001) worstDense = Math.max(worstDense, Math.abs(r.sample!(t)[0]! - Math.exp(-k * t)));
    let worstStep = 0;
    for (let i = 0; i < r.times.length; i++) {
      worstStep = Math.max(worstStep, Math.abs(r.states[i]![0]! - Math.exp(-k * r.times[i]!)));
    }
    expect(worstDense).toBeLessThan(Math.max(5 * worstStep, 1e-6));
  });

  it("reports requested output times by dense output", () => {
    const times = [0, 0.5, 1, 2.5, 7, 10];
    const r = solveOde(decay, [1], { end: 10, outputTimes: times, relativeTolerance: 1e-10, absoluteTolerance: 1e-13 });
    expect(r.outputTimes).toEqual(times);
    r.outputStates.forEach((s, i) => {
      expect(Math.abs(s[0]! - Math.exp(-k * times[i]!))).toBeLessThan(1e-10); // closed form
    });
  });

  it("integrates backwards when end < start", () => {
    const r = solveOde(decay, [Math.exp(-k * 5)], { start: 5, end: 0, relativeTolerance: 1e-10, absoluteTolerance: 1e-14 });
    expect(r.status).toBe("completed");
    expect(Math.abs(r.finalState[0]! - 1)).toBeLessThan(1e-8); // closed form y(0) = 1
  });

  it("stops at the event y = 1/2, at t = ln 2 / k within 1e-9", () => {
    const r = solveOde(decay, [1], {
      end: 100,
      relativeTolerance: 1e-10,
      absoluteTolerance: 1e-12,
      event: (_t, y) => y[0]! - 0.5,
    });
    expect(r.status).toBe("event");
    expect(Math.abs(r.eventTime! - Math.LN2 / k)).toBeLessThan(1e-9); // closed form
    expect(r.eventState![0]).toBeCloseTo(0.5, 9);
    expect(r.finalTime).toBe(r.eventTime);
    expect(r.times[r.times.length - 1]).toBe(r.eventTime);
  });

  it("ignores crossings in the other direction when eventDirection is set", () => {
    const r = solveOde(decay, [1], { end: 10, event: (_t, y) => y[0]! - 0.5, eventDirection: "rising" });
    expect(r.status).toBe("completed");
    expect(r.eventTime).toBeNull();
  });
});

describe("solveOde: harmonic oscillator x'' = -ω² x (closed form cos ωt)", () => {
  const omega = 2;
  const oscillator = (_t: number, y: Float64Array, dy: Float64Array): void => {
    dy[0] = y[1]!;
    dy[1] = -omega * omega * y[0]!;
  };

  it("after 10 periods position and velocity agree with the closed form within 1e-8 at rtol 1e-10", () => {
    const end = 10 * Math.PI; // 10 periods of ω = 2
    const r = solveOde(oscillator, [1, 0], { end, relativeTolerance: 1e-10, absoluteTolerance: 1e-12 });
    expect(Math.abs(r.finalState[0]! - Math.cos(omega * end))).toBeLessThan(1e-8);
    expect(Math.abs(r.finalState[1]! + omega * Math.sin(omega * end))).toBeLessThan(1e-8);
  });

  it("conserves the energy x² + (v/ω)² = 1 within 1e-8 over every step", () => {
    const r = solveOde(oscillator, [1, 0], { end: 10 * Math.PI, relativeTolerance: 1e-10, absoluteTolerance: 1e-12 });
    for (const s of r.states) expect(Math.abs(s[0]! ** 2 + (s[1]! / omega) ** 2 - 1)).toBeLessThan(1e-8);
  });

  it("finds the first zero of x at t = π/(2ω) (falling crossing)", () => {
    const r = solveOde(oscillator, [1, 0], {
      end: 10,
      relativeTolerance: 1e-10,
      absoluteTolerance: 1e-12,
      event: (_t, y) => y[0]!,
      eventDirection: "falling",
    });
    expect(Math.abs(r.eventTime! - Math.PI / (2 * omega))).toBeLessThan(1e-9); // closed form
  });

  it("error falls as the tolerance tightens (convergence)", () => {
    const errorAt = (rtol: number): number => {
      const r = solveOde(oscillator, [1, 0], { end: 2 * Math.PI, relativeTolerance: rtol, absoluteTolerance: rtol * 1e-2 });
      return Math.abs(r.finalState[0]! - Math.cos(omega * 2 * Math.PI));
    };
    expect(errorAt(1e-9)).toBeLessThan(errorAt(1e-5));
    expect(errorAt(1e-5)).toBeLessThan(1e-3);
  });
});

describe("solveOde: run-time problems are reported, not thrown", () => {
  it("status max-steps when the step cap is hit", () => {
    const r = solveOde((_t, y, dy) => { dy[0] = -y[0]!; }, [1], { end: 1000, maxSteps: 3, maxStep: 0.1 });
    expect(r.status).toBe("max-steps");
    expect(r.finalTime).toBeLessThan(1000);
  });

  it("status non-finite when the derivative returns NaN", () => {
    const r = solveOde((_t, _y, dy) => { dy[0] = Number.NaN; }, [1], { end: 1 });
    expect(r.status).toBe("non-finite");
  });

  it("stops with step-too-small or non-finite at a finite-time blow-up (y' = y², y(0) = 1 blows up at t = 1)", () => {
    const r = solveOde((_t, y, dy) => { dy[0] = y[0]! * y[0]!; }, [1], { end: 2 });
    expect(["step-too-small", "non-finite", "max-steps"]).toContain(r.status);
    expect(r.finalTime).toBeLessThan(1.0001);
    expect(r.finalTime).toBeGreaterThan(0.999);
  });
});

describe("solveOde: bad input throws InputError", () => {
  const f = (_t: number, y: Float64Array, dy: Float64Array): void => { dy[0] = -y[0]!; };
  it.each([
    ["derivative not a function", () => solveOde(42 as never, [1], { end: 1 })],
    ["empty state", () => solveOde(f, [], { end: 1 })],
    ["non-finite state", () => solveOde(f, [Number.NaN], { end: 1 })],
    ["end equal to start", () => solveOde(f, [1], { start: 1, end: 1 })],
    ["non-finite end", () => solveOde(f, [1], { end: Infinity })],
    ["relative tolerance too small", () => solveOde(f, [1], { end: 1, relativeTolerance: 1e-16 })],
    ["negative absolute tolerance", () => solveOde(f, [1], { end: 1, absoluteTolerance: -1 })],
    ["absolute tolerance of wrong length", () => solveOde(f, [1], { end: 1, absoluteTolerance: [1, 2] })],
    ["maxSteps not an integer", () => solveOde(f, [1], { end: 1, maxSteps: 1.5 })],
    ["unordered output times", () => solveOde(f, [1], { end: 1, outputTimes: [0.5, 0.2] })],
    ["event not a function", () => solveOde(f, [1], { end: 1, event: 3 as never })],
  ])("%s", (_name, call) => {
    expect(call).toThrow(InputError);
  });

  it("sample outside the solved interval throws InputError", () => {
    const r = solveOde(f, [1], { end: 1, dense: true });
    expect(() => r.sample!(2)).toThrow(InputError);
  });
});
