// Chart colours from Coldknit's palette (tailwind.config.ts): one line colour per logger, bands in moss, the freeze
// limit in ice blue, batch moves in soft ink.
export const LOGGER_COLOURS = ['#2e4152', '#a8601a', '#35684f', '#1f5fa8', '#b3261e', '#44525e'];
export const loggerColour = (index: number) => LOGGER_COLOURS[index % LOGGER_COLOURS.length];
export const BAND_FILL = 'rgba(53, 104, 79, 0.12)';
export const BAND_TEXT = '#264d3a';
export const FREEZE_LINE = '#1f5fa8';
export const MOVE_LINE = '#44525e';
export const GRID_LINE = '#dbe8ee';
export const ZOOM_FILL = 'rgba(31, 95, 168, 0.15)';
