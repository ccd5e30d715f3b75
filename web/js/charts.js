// Charts drawn with Chart.js (served from the jar under /webjars). Colours meet WCAG AA against
// white; each series is also told apart by line style, so colour is never the only cue.



const INK = '#1f2933';
const ACTUAL = '#1d4ed8';
const FITTED = '#b45309';
const FORECAST = '#6d28d9';
const RESIDUAL = '#0f766e';

/** Paints the canvas white first, so exported PNGs have a background. */
const whiteBackground = {
  id: 'whiteBackground',
  beforeDraw(chart) {
    const { ctx, width, height } = chart;
    ctx.save();
    ctx.globalCompositeOperation = 'destination-over';
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(0, 0, width, height);
    ctx.restore();
  },
};

const charts = new Map();

function draw(canvas, config) {
  charts.get(canvas)?.destroy();
  config.plugins = [whiteBackground];
  config.options = {
    animation: false,
    responsive: true,
    maintainAspectRatio: false,
    color: INK,
    ...config.options,
  };
  const chart = new window.Chart(canvas, config);
  charts.set(canvas, chart);
  return chart;
}

function padded(values, before, after) {
  return [...Array(before).fill(null), ...values, ...Array(after).fill(null)];
}

const bandColours = { 0.8: 'rgba(109, 40, 217, 0.28)', 0.95: 'rgba(109, 40, 217, 0.12)' };

function bandDatasets(chart, observed) {
  const sorted = [...chart.bands].sort((a, b) => b.level - a.level);
  return sorted.flatMap((band) => {
    const label = `${Math.round(band.level * 100)}% interval`;
    const colour = bandColours[band.level] || 'rgba(109, 40, 217, 0.18)';
    return [
      { label, data: padded(band.upper, observed, 0), borderWidth: 0, pointRadius: 0, fill: '+1', backgroundColor: colour },
      { label: `${label} (lower)`, data: padded(band.lower, observed, 0), borderWidth: 0, pointRadius: 0, fill: false },
    ];
  });
}

/** Actuals, fitted trend, forecast and its interval bands; logScale puts the y axis on a log scale. */
export function forecastChart(canvas, chart, logScale) {
  const observed = chart.periods.length;
  const ahead = chart.forecastPeriods.length;
  return draw(canvas, {
    type: 'line',
    data: {
      labels: [...chart.periods, ...chart.forecastPeriods],
      datasets: [
        { label: 'Actual', data: padded(chart.actual, 0, ahead), borderColor: ACTUAL, backgroundColor: ACTUAL, pointRadius: 2, borderWidth: 2 },
        { label: 'Fitted trend', data: padded(chart.fitted, 0, ahead), borderColor: FITTED, borderDash: [6, 4], pointRadius: 0, borderWidth: 2 },
        { label: 'Forecast', data: padded(chart.forecast, observed, 0), borderColor: FORECAST, backgroundColor: FORECAST, pointRadius: 2, borderWidth: 2, borderDash: [2, 3] },
        ...bandDatasets(chart, observed),
      ],
    },
    options: {
      scales: { y: { type: logScale ? 'logarithmic' : 'linear', ticks: { color: INK } }, x: { ticks: { color: INK, maxRotation: 0, autoSkip: true } } },
      plugins: { legend: { labels: { color: INK, filter: (item) => !item.text.endsWith('(lower)') } } },
    },
  });
}

/** Residuals over time with the zero line. */
export function residualChart(canvas, chart) {
  return draw(canvas, {
    type: 'line',
    data: {
      labels: chart.periods,
      datasets: [
        { label: `Residual (${chart.residualScale} scale)`, data: chart.residuals, borderColor: RESIDUAL, backgroundColor: RESIDUAL, pointRadius: 2, borderWidth: 1.5 },
        { label: 'Zero', data: chart.periods.map(() => 0), borderColor: INK, borderWidth: 1, pointRadius: 0, borderDash: [4, 4] },
      ],
    },
    options: { scales: { x: { ticks: { color: INK, maxRotation: 0 } }, y: { ticks: { color: INK } } }, plugins: { legend: { labels: { color: INK } } } },
  });
}

/** Residual autocorrelations r_1..r_k as bars with the ±2/√n band. */
export function autocorrelationChart(canvas, chart) {
  const lags = chart.autocorrelations.map((_, i) => String(i + 1));
  const band = chart.autocorrelationBand;
  return draw(canvas, {
    type: 'bar',
    data: {
      labels: lags,
      datasets: [
        { type: 'bar', label: 'Autocorrelation', data: chart.autocorrelations, backgroundColor: RESIDUAL },
        { type: 'line', label: '+2/√n', data: lags.map(() => band), borderColor: INK, borderDash: [4, 4], pointRadius: 0, borderWidth: 1 },
        { type: 'line', label: '−2/√n', data: lags.map(() => -band), borderColor: INK, borderDash: [4, 4], pointRadius: 0, borderWidth: 1 },
      ],
    },
    options: {
      scales: { x: { title: { display: true, text: 'Lag', color: INK }, ticks: { color: INK } }, y: { min: -1, max: 1, ticks: { color: INK } } },
      plugins: { legend: { labels: { color: INK } } },
    },
  });
}

/** A small line of the values, drawn directly on the canvas (no axes). */
export function sparkline(canvas, values) {
  const ctx = canvas.getContext('2d');
  const { width, height } = canvas;
  ctx.clearRect(0, 0, width, height);
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length < 2) return;
  const low = Math.min(...finite);
  const span = Math.max(...finite) - low || 1;
  ctx.strokeStyle = ACTUAL;
  ctx.lineWidth = 1.5;
  ctx.beginPath();
  values.forEach((v, i) => {
    const x = (i / (values.length - 1)) * (width - 2) + 1;
    const y = height - 1 - ((v - low) / span) * (height - 2);
    if (i === 0) ctx.moveTo(x, y); else ctx.lineTo(x, y);
  });
  ctx.stroke();
}

/** The chart's picture as a PNG Blob. */
export function png(canvas) {
  return new Promise((resolve) => canvas.toBlob(resolve, 'image/png'));
}
