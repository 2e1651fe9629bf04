// plotly.js ships types for its complete entry only; its per-trace entries are plain CommonJS.
declare module 'plotly.js/lib/core' {
  import Plotly from 'plotly.js'
  const core: typeof Plotly & { register(modules: unknown[]): void }
  export default core
}
declare module 'plotly.js/lib/heatmap' { const trace: unknown; export default trace }
declare module 'plotly.js/lib/scatter3d' { const trace: unknown; export default trace }
declare module 'plotly.js/lib/surface' { const trace: unknown; export default trace }
