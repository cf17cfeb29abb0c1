import * as W from './src/water/if97/index.js';
console.log(W.saturationPressure(W.T_CRITICAL) - W.P_CRITICAL, W.saturationTemperature(W.P_CRITICAL) - W.T_CRITICAL, W.saturationPressure(W.T_CRITICAL-1e-4));
