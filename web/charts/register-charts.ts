import {
  BarController, BarElement, CategoryScale, Chart, Filler, Legend, LinearScale, LineController, LineElement, LogarithmicScale, PointElement, Tooltip,
} from 'chart.js';

// Only the chart.js parts the findings use, so the bundle leaves the rest out.
Chart.register(LineController, LineElement, PointElement, LinearScale, LogarithmicScale, Filler, Legend, Tooltip);
// The ranked sensitivity bars (sl-sensitivity-panel).
Chart.register(BarController, BarElement, CategoryScale);

/** chart.js with the line and bar charts, category, linear and logarithmic scales, fills, legend and tooltips registered. */
export { Chart };
