import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { createMemoryRouter, RouterProvider } from "react-router";
import { describe, expect, it } from "vitest";
import { PatternCreator } from "./pattern-creator";

describe("adding a pattern to the library", () => {
  it("says what it needs before a file is chosen, and its button answers a click instead of sitting disabled", () => {
    const router = createMemoryRouter([{ path: "/", element: createElement(PatternCreator) }]);
    const html = renderToStaticMarkup(createElement(RouterProvider, { router }));
    expect(html).toContain("Choose the CSV file of the cuts");
    const button = /<button[^>]*>Save to the library<\/button>/.exec(html)?.[0] ?? "";
    expect(button).not.toBe("");
    expect(button).not.toMatch(/\sdisabled(=""|\s|>)/);
  });
});
