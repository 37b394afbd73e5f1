// Loaded after the first paint by <LazyMotion> in providers.tsx: every animation feature,
// including the drag the sample board's canvas uses, out of the pages' first-load JavaScript.
import { domMax } from "framer-motion";

export default domMax;
