// Entry of the record's KaTeX block (cells/record/vite-plugin.ts builds it as a classic
// script that sets globalThis.__loadtraceKatex = { katex }; cells/record/katex-proxy.ts
// runs it). A named export, so the global is always that object.
export { default as katex } from 'katex';
