export * from './oiml-coefficients';
export * from './oiml-density';
export * from './mass-fraction-solver';
export * from './molar-masses';
export * from './concentration';
export * from './excess-volume';
export * from './blending';
export * from './distillate-analysis';
