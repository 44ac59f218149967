export * from './caseFile';
export * from './planFile';
export * from './resultTable';
export * from './units';
