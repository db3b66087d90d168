// The few psychrolib functions the tests use as an ASHRAE reference (the package ships no types).
declare module 'psychrolib' {
  type Psychrolib = {
    SI: number;
    IP: number;
    SetUnitSystem(system: number): void;
    GetSatVapPres(tDryBulbC: number): number;
    GetHumRatioFromRelHum(tDryBulbC: number, relHum: number, pressurePa: number): number;
    GetHumRatioFromTDewPoint(tDewPointC: number, pressurePa: number): number;
    GetStandardAtmPressure(altitudeM: number): number;
    GetMoistAirEnthalpy(tDryBulbC: number, humRatio: number): number;
  };
  const psychrolib: Psychrolib;
  export default psychrolib;
}
