/**
 * The Plotly React component bound to the prebuilt minified bundle. This module is the heavy
 * chunk (several MB of plotly.js): it is only ever reached through the dynamic import in plot.tsx,
 * so it is fetched in the browser by the pages that plot, and never rendered on the server.
 */
import createPlotlyComponent from 'react-plotly.js/factory'
import Plotly from 'plotly.js-dist-min'

const PlotlyComponent = createPlotlyComponent(Plotly)
export default PlotlyComponent
