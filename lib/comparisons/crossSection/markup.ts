/**
 * SVG markup from a React element tree of plain function components and SVG elements, without
 * react-dom/server: the quote PDF and the share image are made in route handlers and server
 * components, where React's server renderer is not available, and they need the drawing the page
 * shows (CrossSectionSvg.tsx), not a second drawing. Hooks and context are not supported (the
 * drawing has none); a component that used one would throw here, loudly, not draw wrong.
 *
 * Attribute names follow React's spelling for SVG: camelCase presentation attributes become
 * kebab-case (strokeWidth → stroke-width), `className` → `class`, a `style` object → CSS text;
 * `key`, `children`, undefined, null and false are left out. The unit test checks the output
 * against react-dom/server's for the whole drawing.
 */
import { Fragment, type ReactElement, type ReactNode, isValidElement } from "react";

/** Attributes SVG spells in camelCase itself (React passes them through unchanged). */
const CAMEL = new Set([
  "viewBox",
  "preserveAspectRatio",
  "gradientUnits",
  "gradientTransform",
  "patternUnits",
  "markerWidth",
  "markerHeight",
]);

/** A host element's props as another pair of props, or several (e.g. a text drawn twice). */
export type HostRewrite = (type: string, props: Record<string, unknown>) => Record<string, unknown>[];

/** Escaped as React's server renderer does, in text and in attributes alike. */
const ESC: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#x27;" };
const esc = (s: string) => s.replace(/[&<>"']/g, (c) => ESC[c]!);
const kebab = (k: string) =>
  CAMEL.has(k) || k.startsWith("data-") || k.startsWith("aria-") ? k : k.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`);

function styleText(style: Record<string, unknown>): string {
  return Object.entries(style)
    .filter(([, v]) => v !== undefined && v !== null && v !== "")
    .map(([k, v]) => `${kebab(k)}:${String(v)}`)
    .join(";");
}

function attrs(props: Record<string, unknown>): string {
  let out = "";
  for (const [k, v] of Object.entries(props)) {
    if (k === "children" || k === "key" || v === undefined || v === null || v === false) continue;
    if (k === "style") {
      const css = styleText(v as Record<string, unknown>);
      if (css) out += ` style="${esc(css)}"`;
      continue;
    }
    const name = k === "className" ? "class" : kebab(k);
    out += ` ${name}="${esc(v === true ? "" : String(v))}"`;
  }
  return out;
}

/**
 * The markup of `node`.
 * @example
 * svgMarkup(<svg viewBox="0 0 2 2"><path strokeWidth={1} d="M 0 0 L 2 2" /></svg>);
 * // '<svg viewBox="0 0 2 2"><path stroke-width="1" d="M 0 0 L 2 2"></path></svg>'
 */
export function svgMarkup(node: ReactNode, rewrite?: HostRewrite): string {
  if (node === null || node === undefined || typeof node === "boolean") return "";
  if (typeof node === "string" || typeof node === "number" || typeof node === "bigint") return esc(String(node));
  if (Array.isArray(node)) return node.map((n: ReactNode) => svgMarkup(n, rewrite)).join("");
  if (!isValidElement(node)) throw new Error("svgMarkup: only elements, text and arrays can be drawn.");
  const el = node as ReactElement<Record<string, unknown>>;
  const props = el.props;
  if (el.type === Fragment) return svgMarkup(props.children as ReactNode, rewrite);
  if (typeof el.type === "function") {
    const render = el.type as (p: Record<string, unknown>) => ReactNode;
    return svgMarkup(render(props), rewrite);
  }
  if (typeof el.type !== "string") throw new Error("svgMarkup: only function components and SVG elements can be drawn.");
  const type = el.type;
  return (rewrite ? rewrite(type, props) : [props])
    .map((p) => `<${type}${attrs(p)}>${svgMarkup(p.children as ReactNode, rewrite)}</${type}>`)
    .join("");
}
