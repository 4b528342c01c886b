// chart.js is tree-shaken: every chart of ours needs these parts registered once before it draws.
import { CategoryScale, Chart, Filler, Legend, LinearScale, LineElement, PointElement, TimeScale, Tooltip } from 'chart.js';
import 'chartjs-adapter-luxon';
import annotationPlugin from 'chartjs-plugin-annotation';
import zoomPlugin from 'chartjs-plugin-zoom';

Chart.register(LineElement, PointElement, LinearScale, CategoryScale, TimeScale, Tooltip, Legend, Filler, annotationPlugin, zoomPlugin);
