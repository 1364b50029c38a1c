import { describe, expect, it } from "vitest";
import { backdropCorners, backdropToSite, boundsOf, makeFrame, scaleBarMetres, snap } from "./plan-frame";

describe("plan frame", () => {
  const frame = makeFrame({ minX: 0, minY: 0, maxX: 40, maxY: 20 }, { width: 920, margin: 3 });

  it("maps site metres to pixels with north up and back again", () => {
    // (−3, 23) is the top-left corner after the 3 m margin; y grows downwards on screen.
    expect(frame.toPx(-3, 23)).toEqual([0, 0]);
    const [px, py] = frame.toPx(10, 5);
    expect(px).toBeCloseTo(13 * frame.scale, 9);
    expect(py).toBeCloseTo(18 * frame.scale, 9);
    const [x, y] = frame.toSite(px, py);
    expect(x).toBeCloseTo(10, 9);
    expect(y).toBeCloseTo(5, 9);
  });

  it("fits the width and keeps the aspect of the ground", () => {
    expect(frame.width).toBe(920);
    expect(frame.scale).toBeCloseTo(920 / 46, 9);
    expect(frame.height).toBe(Math.round(26 * frame.scale));
  });

  it("widens a tall, narrow site so the plan does not become a strip", () => {
    const tall = makeFrame({ minX: 0, minY: 0, maxX: 2, maxY: 100 }, { margin: 0, maxAspect: 1 });
    expect(tall.bounds.maxX - tall.bounds.minX).toBeCloseTo(100, 9);
    expect(tall.height).toBe(tall.width);
  });

  it("gives an empty site a 20 m square around the origin", () => {
    expect(boundsOf([])).toEqual({ minX: -10, minY: -10, maxX: 10, maxY: 10 });
    expect(boundsOf([[1, 2], [-3, 5], [Number.NaN, 0]])).toEqual({ minX: -3, minY: 2, maxX: 1, maxY: 5 });
  });

  it("snaps to 0.1 m without float noise", () => {
    expect(snap(1.2345)).toBe(1.2);
    expect(snap(1.25)).toBe(1.3);
    expect(snap(-0.04)).toBe(0); // never "-0" on screen
    expect(snap(12.06, 0.5)).toBe(12);
  });

  it("picks a 1-2-5 scale bar near a quarter of the width", () => {
    expect(scaleBarMetres(frame)).toBe(10);
    expect(scaleBarMetres(makeFrame({ minX: 0, minY: 0, maxX: 200, maxY: 100 }, { margin: 0 }))).toBe(50);
  });

  it("places a roof drawing from two points a known distance apart (common practice, no source)", () => {
    // 200 px between the points standing for 10 m: 0.05 m per pixel; p1 lands on (5, 5).
    const b = { widthPx: 400, heightPx: 200, p1: [100, 100] as [number, number], p2: [300, 100] as [number, number], distanceM: 10, originX: 5, originY: 5, rotationDeg: 0 };
    expect(backdropToSite(b, 100, 100)).toEqual([5, 5]);
    expect(backdropToSite(b, 300, 100)).toEqual([15, 5]);
    // Image y runs down, site y runs north: a pixel 100 px lower is 5 m further south.
    expect(backdropToSite(b, 100, 200)).toEqual([5, 0]);
    expect(backdropCorners(b)).toEqual([[0, 10], [20, 10], [20, 0], [0, 0]]);
    // Turned 90° clockwise on the plan: the image's rightward x now points south.
    const [x, y] = backdropToSite({ ...b, rotationDeg: 90 }, 300, 100);
    expect(x).toBeCloseTo(5, 9);
    expect(y).toBeCloseTo(-5, 9);
  });
});
