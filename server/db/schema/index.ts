export * from './auth';
export * from './robot';
