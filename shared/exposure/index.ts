// The exposure engine's public surface.
export * from './types';
export * from './accumulator';
export * from './combine';
export * from './report';
export * from './callusRate';
export * from './callusForecast';
export * from './trend';
