// The drawing lives in ./crossSection/ (one component per file); this path stays for its callers.
export { CrossSection, type DrawnLimits } from "./crossSection/CrossSection";
