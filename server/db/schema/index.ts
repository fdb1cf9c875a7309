export * from './auth';
export * from './robot';
export * from './recordings';
export * from './notes';
export * from './panels';
export * from './cycles';
export * from './drills';
