import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ComparisonChart } from "@/components/compare/comparison-chart";
import type { ChartInput } from "@/components/compare/chart-model";

// The chart as the server renders it: the same markup the browser hydrates, so what is read here is what a
// screen reader and a text copy get.
const columns: ChartInput[] = [
  { name: "Large panel with shared inputs", inputs: { used: 36, total: 36, spare: 0 }, coverage: { used: 36, covered: 9, share: 0.25 } },
  { name: "One detector per input", inputs: { used: 41, total: 44, spare: 3 }, coverage: { used: 41, covered: 38, share: 38 / 41 } },
];

const textOf = (html: string) => html.replace(/<title[^>]*>[\s\S]*?<\/title>/, "").replace(/<[^>]+>/g, "");

describe("comparison chart markup", () => {
  const html = renderToStaticMarkup(createElement(ComparisonChart, { columns }));

  it("renders its title with the figures on the server, so hydration finds the same text", () => {
    const title = /<title id="cmp-chart-title">([^<]*)<\/title>/.exec(html);
    expect(title?.[1]).toContain("Large panel with shared inputs: 0 of 36 (0 %) spare, coverage 9 of 36 (25 %)");
  });

  it("keeps the space where a layout's name is broken over two lines", () => {
    const text = textOf(html);
    expect(text).toContain("Large panel with shared inputs");
    expect(text).not.toMatch(/withshared/);
  });
});
