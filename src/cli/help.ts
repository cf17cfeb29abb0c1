/**
 * The `heatstate --help` text. Every line under `examples:` is run by tests/cli.test.ts.
 *
 * @module
 */
import { fluidNames } from '../fluids/index.js';

/** The help text. */
export function helpText(): string {
  return `heatstate: thermophysical properties from the shell

usage:
  heatstate water <name=value> <name=value> [--transport]
        a water or steam state (IAPWS-IF97); pairs: T,p  p,h  p,s  h,s  T,x  p,x  T,v  T,rho
        --transport adds viscosity mu, thermal conductivity lambda, kinematic viscosity nu,
        thermal diffusivity alpha and Prandtl number Pr (IAPWS R12-08 and R15-11)
  heatstate sat T=<value> | p=<value> [--transport]
        saturated liquid (f) and vapour (g); --transport adds both phases' mu, lambda, nu,
        alpha, Pr and the surface tension sigma (IAPWS R1-76(2014))
  heatstate gas <species> T=<value> [p=<value>] | h=<value> p=<value> | s=<value> p=<value> [--transport]
        ideal-gas properties (NASA polynomials); one species; --transport adds the dilute-gas
        mu, lambda and Pr (with nu and alpha when p is given) where the species has transport data
  heatstate liquid <substance> T1=<value> T2=<value> [p1=<value>] [p2=<value>] [--transport]
        incompressible mean c, Δu, Δh and Δs between two states (p1, p2 default 1 atm);
        --transport adds mu, lambda, nu, alpha and Pr at both states (lambda and alpha of a solid)
  heatstate air <two of T, Twb, Tdp, RH, W, h> [p=<value> | altitude=<value>]
        a humid-air state (default 101.325 kPa); RH as 0.5 or 50%, W as 0.01, "10 g/kg" or
        "70 gr/lbm"; W, h, v and cp are per kg of dry air
  heatstate air-mix <two of T1, Twb1, Tdp1, RH1, W1, h1> flow1=<value> <the same for stream 2, …>
                    [p=<value> | altitude=<value>]
        adiabatic mixing of two or more streams; a flow is a dry-air mass flow (kg/s, lbm/h)
        or a volume flow (m³/s, cfm) converted at its stream's own state
  heatstate coil <two of T1, Twb1, Tdp1, RH1, W1, h1> flow=<value>
                 ADP=<value> BF=<number> | T2=<value> RH2=<value>
                 [Tcondensate=<value>] [p=<value> | altitude=<value>]
        a cooling coil with dehumidification, from its apparatus dew point ADP and bypass
        factor BF, or from the leaving dry-bulb T2 and RH2: leaving air, sensible, latent
        and total loads (negative: heat leaves the air), coil duty, SHR and condensate
  heatstate fluid <name> <name=value> <name=value>
  heatstate fluid <name> sat T=<value> | p=<value>
        a real-fluid state or saturation row from its reference equation of state; fluids:
        ${fluidNames().join(', ')} (water by IAPWS-95); pairs as for water

options:
  --units si|us           units of the output (default si: K, kPa, kJ/kg, g/kg, mPa·s, kW, …;
                          us: °F, psia, Btu/lbm, gr/lbm, lbm/(ft·h), Btu/h, …)
  --json                  JSON instead of a table
  --transport             transport properties (water, sat and gas)
  --help                  this text

Values are decimal numbers with units (T=300K, p="1 atm"), quoted when they contain spaces;
x, BF and RH (as a fraction) are plain numbers. Hexadecimal, octal and binary numbers, empty
values, unknown names and options, and more or fewer inputs than a state needs are refused.

errors: one line on stderr. Exit code 0: done; 1: an input value was refused (unreadable,
out of range, no such state); 2: the command line itself (unknown command, option or name,
a wrong set of inputs; see this text). A range error states the value and the limits in the
unit you wrote the input in, with SI beside it; under --units us, when the input was not in
a US unit, the value and the limits in US units follow.

examples:
  heatstate water p="10 MPa" T="500 °C"
  heatstate water p=150psig x=0.95 --units us
  heatstate water p="1 atm" h="1500 kJ/kg" --json
  heatstate water T="25 °C" p="1 atm" --transport
  heatstate water T=400degF p=500psia --transport --units us
  heatstate sat T=212degF --units us
  heatstate sat p="1 MPa" --transport
  heatstate gas N2 T="800 K" p="5 bar"
  heatstate gas air h="500 kJ/kg" p="1 atm"
  heatstate gas N2 T=80degF p=14.7psia --transport --units us
  heatstate liquid copper T1="20 °C" T2="120 °C"
  heatstate liquid "engine oil" T1="20 °C" T2="60 °C" --transport
  heatstate liquid water T1=25degC T2=25degC p1="1 atm" p2="500 psia" --units us
  heatstate air T="30 °C" RH=50%
  heatstate air T=86degF Twb=70degF altitude="5000 ft" --units us
  heatstate air T="24 °C" W="9 g/kg" p="95 kPa" --json
  heatstate air-mix T1="32 °C" RH1=0.5 flow1="1 kg/s" T2="24 °C" RH2=50% flow2="3 kg/s"
  heatstate air-mix T1=95degF Twb1=75degF flow1="2000 cfm" T2=75degF RH2=50% flow2="6000 cfm" --units us
  heatstate coil T1="26 °C" RH1=0.5 flow="4 kg/s" ADP="10 °C" BF=0.15
  heatstate coil T1=80degF Twb1=67degF flow="8000 cfm" T2=55degF RH2=90% --units us
  heatstate fluid water T="500 K" rho="838.025 kg/m³"
  heatstate fluid water sat p="101.325 kPa"
  heatstate fluid R-718 T=300degF p=50psia --units us --json

Results are engineering estimates: defer to local codes and licensed professionals.`;
}
