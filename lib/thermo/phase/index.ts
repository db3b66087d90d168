export { classifyInlet, type InletClassification } from './classify';
export { flashCooler, type CoolerFlash, type CondensatePhase } from './cooler';
export { dewPointPressures, dewPointTemperature, type DewPoint, type NoDewPoint } from './dew-point';
export { vapourPressure, saturationTemperature } from './pure';
export { stabilityTest, type StabilityResult } from './stability';
export { flash, type FlashResult } from './flash';
export { threePhaseFlash, type ThreePhaseResult } from './three-phase';
export { rachfordRice } from './rachford-rice';
export { pseudoCritical } from './pseudo-critical';
