export * from './enums';
export * from './users';
export * from './accounts';
export * from './sizings';
export * from './quotes';
export * from './datasheets';
export * from './billing';
export * from './ops';
