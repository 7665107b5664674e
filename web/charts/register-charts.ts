import { Chart, Filler, Legend, LinearScale, LineController, LineElement, LogarithmicScale, PointElement, Tooltip } from 'chart.js';

// Only the chart.js parts the findings use, so the bundle leaves the rest out.
Chart.register(LineController, LineElement, PointElement, LinearScale, LogarithmicScale, Filler, Legend, Tooltip);

/** chart.js with the line charts, linear and logarithmic scales, fills, legend and tooltips registered. */
export { Chart };
