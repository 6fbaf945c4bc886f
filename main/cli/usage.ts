// The help text of `lanewright`, in a module of its own so `--help` loads nothing else (no engine).

/** Usage text of the planning options every command that loads a network reads (load-network.ts). */
export const LOAD_NETWORK_USAGE =
  '[--date YYYY-MM-DD] [--vehicle-class C] [--skip-invalid] [--drive-limit eu|us|HOURS] [--detour-factor F]\n' +
  '    [--fuel-consumption L_PER_100KM] [--fuel-price PRICE] [--average-speed KMH] [--default-toll AMOUNT]\n' +
  '    [--currency CODE] [--rates CODE=RATE,...]';

/** The whole help screen. */
export const USAGE = `usage:
  lanewright routes --depots FILE --lanes FILE --from DEPOT_ID [--to DEPOT_ID,...] [--no-paths] [--max-legs K] [--json]
                   [--out FILE] [--timings]
  lanewright check --depots FILE --lanes FILE [--json] [--date D] [--vehicle-class C]
  lanewright export --depots FILE --lanes FILE [--from DEPOT_ID] [--lanes-out FILE] [--routes-out FILE]
                    [--loops-out FILE] [--geojson-out FILE]
  lanewright audit --depots FILE --lanes FILE [--date D] [--vehicle-class C] [--loop-cap N] [--negotiable REF,...]
                   [--json] [--out FILE] [--loops-csv FILE] [--progress] [--timings]
  lanewright compare --depots FILE --lanes FILE --scenario FILE --from DEPOT_ID [--date D] [--loop-cap N] [--json] [--out FILE]
  lanewright dispatch --depots FILE --lanes FILE --loads FILE [--vehicles FILE] [--alternatives K] [--json] [--out FILE] [--timings]
  Planning options (routes, check, export, audit, compare, dispatch):
    ${LOAD_NETWORK_USAGE}

Results are cost estimates. Vehicle restrictions (height, weight, hazardous goods), driver hours and
local regulations apply; defer to local codes and licensed practice.`;
