// `lanewright dispatch` end to end (read depots, lanes, vehicles and 10,000 loads from disk, plan,
// report, write the CSV) on a seeded 5,000-depot / 50,000-lane network, beside a baseline in the same
// run that solves once per load (restricted solve, plus one without limits when lanes are closed) on
// the same priced networks. The baseline runs on the first 500 loads and is scaled to 10,000 (stated).

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildOverlay } from '../../../engine/scenario/overlay';
import { priceDay, pricingKeyText, type PricedDay } from '../../../engine/dispatch/day-pricing';
import { closedLanes, restrictedWeights, restrictionProfile } from '../../../engine/dispatch/vehicle-limits';
import { importLoads, importVehicles } from '../../../engine/import/import-loads';
import { importNetwork } from '../../../engine/planning/import-network';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';
import { main } from '../../../main/cli/run';
import { seeded, type BenchSuite } from '../harness';

const DEPOTS = 5_000;
const LANES = 50_000;
const LOADS = 10_000;
const HUBS = 25;
const BASELINE_LOADS = 500;
const DATES = ['2026-09-14', '2026-09-15'];

function writeFiles(folder: string) {
  const random = seeded(20260914);
  const depots = ['id,name,lat,lon'];
  for (let d = 0; d < DEPOTS; d++) depots.push(`D${d},Depot ${d},${(45 + random() * 10).toFixed(4)},${(random() * 15).toFixed(4)}`);
  const lanes = ['from,to,ref,toll,toll_2axle,toll_5axle,fuel,fees,rebate,distance_km,drive_minutes,max_height_m,max_weight_t,tunnel_category'];
  // A ring keeps every depot reachable; the rest are random lanes. Rebates stay below each lane's costs.
  for (let e = 0; e < LANES; e++) {
    const from = e < DEPOTS ? e : Math.floor(random() * DEPOTS);
    const to = e < DEPOTS ? (e + 1) % DEPOTS : (from + 1 + Math.floor(random() * (DEPOTS - 1))) % DEPOTS;
    const toll = random() * 80;
    const fuel = 20 + random() * 200;
    const rebate = e % 9 === 0 ? random() * 15 : 0;
    const height = e % 20 === 0 ? (3.8 + random() * 0.6).toFixed(2) : '';
    const weight = e % 31 === 0 ? String(18 + Math.floor(random() * 20)) : '';
    const tunnel = e % 97 === 0 ? 'BCDE'[Math.floor(random() * 4)] : '';
    lanes.push(`D${from},D${to},L${e},${toll.toFixed(2)},${(toll / 2).toFixed(2)},${toll.toFixed(2)},${fuel.toFixed(2)},5.00,${rebate.toFixed(2)},${(30 + random() * 300).toFixed(1)},${Math.round(30 + random() * 250)},${height},${weight},${tunnel}`);
  }
  const vehicles = [
    'vehicle,vehicle_class,height_m,width_m,length_m,weight_t,axle_load_t,tunnel_code,carriage',
    'DD1,5axle,4.20,2.55,16.5,40,11.5,,',
    'A1,5axle,4.00,2.55,16.5,40,11.5,,',
    'A2,5axle,4.00,2.55,16.5,40,11.5,,',
    'R1,2axle,3.60,2.55,10,18,10,,',
    'T1,5axle,3.90,2.55,16.5,40,11.5,D/E,tank',
    'T2,5axle,3.90,2.55,16.5,40,11.5,C/D,',
  ];
  const ids = ['DD1', 'A1', 'A2', 'R1', 'T1', 'T2', ''];
  const loads = ['load,from,to,date,vehicle,vehicle_class'];
  for (let i = 0; i < LOADS; i++) {
    const from = Math.floor(random() * HUBS) * 199;
    let to = Math.floor(random() * DEPOTS);
    if (to === from) to = (to + 1) % DEPOTS;
    const vehicle = ids[Math.floor(random() * ids.length)];
    loads.push(`B${i},D${from},D${to},${DATES[i % 2]},${vehicle},${vehicle === '' ? '2axle' : ''}`);
  }
  const paths = { depots: join(folder, 'depots.csv'), lanes: join(folder, 'lanes.csv'), vehicles: join(folder, 'vehicles.csv'), loads: join(folder, 'loads.csv'), out: join(folder, 'dispatch.csv') };
  writeFileSync(paths.depots, depots.join('\n') + '\n');
  writeFileSync(paths.lanes, lanes.join('\n') + '\n');
  writeFileSync(paths.vehicles, vehicles.join('\n') + '\n');
  writeFileSync(paths.loads, loads.join('\n') + '\n');
  return { paths, text: { depots: depots.join('\n'), lanes: lanes.join('\n'), vehicles: vehicles.join('\n'), loads: loads.join('\n') } };
}

export const suite: BenchSuite = {
  name: 'dispatch',
  async run(record) {
    const folder = mkdtempSync(join(tmpdir(), 'lanewright-bench-dispatch-'));
    try {
      const { paths, text } = writeFiles(folder);
      const argv = ['dispatch', '--depots', paths.depots, '--lanes', paths.lanes, '--vehicles', paths.vehicles, '--loads', paths.loads, '--date', DATES[0], '--out', paths.out];
      const quiet = process.stderr.write.bind(process.stderr);
      let best = Infinity;
      let bestCpu = Infinity;
      const cpuMs = (since: NodeJS.CpuUsage) => {
        const c = process.cpuUsage(since);
        return (c.user + c.system) / 1000;
      };
      for (let run = 0; run < 2; run++) {
        (process.stderr as { write: unknown }).write = () => true;
        const cpu0 = process.cpuUsage();
        const start = performance.now();
        let status: number;
        try {
          status = await main(argv);
        } finally {
          (process.stderr as { write: unknown }).write = quiet;
        }
        best = Math.min(best, performance.now() - start);
        bestCpu = Math.min(bestCpu, cpuMs(cpu0));
        if (status !== 0) throw new Error(`dispatch exited ${status}`);
      }

      // Baseline: the same priced networks, one solve per load (and one without limits when closed).
      const imported = importNetwork(text.depots, text.lanes, { plan: { date: DATES[0] } });
      const vehicles = importVehicles(text.vehicles, { classes: imported.vehicleClasses });
      const loads = importLoads(text.loads, { depots: imported.network!.depotIndex, vehicles: vehicles.byId, classes: imported.vehicleClasses, planDate: DATES[0] }).loads.slice(0, BASELINE_LOADS);
      const overlay = buildOverlay(imported, null);
      const days = new Map<string, PricedDay>();
      for (const l of loads) {
        const key = { date: l.date, vehicleClass: l.vehicleClass, fuelLitresPer100Km: null };
        if (!days.has(pricingKeyText(key))) days.set(pricingKeyText(key), priceDay(imported, overlay, key, {}, false));
      }
      const baseCpu0 = process.cpuUsage();
      const baseStart = performance.now();
      let solves = 0;
      for (const l of loads) {
        const day = days.get(pricingKeyText({ date: l.date, vehicleClass: l.vehicleClass, fuelLitresPer100Km: null }))!;
        const vehicle = l.vehicle === null ? null : vehicles.byId.get(l.vehicle)!;
        const closed = closedLanes(day.network, day.laneRecord, imported.lanes.limits, restrictionProfile(l, vehicle));
        const origin = day.network.depotIndex.get(l.from)!;
        cheapestRoutes(day.network, origin, closed ? restrictedWeights(day.network, closed) : undefined);
        solves++;
        if (closed) {
          cheapestRoutes(day.network, origin);
          solves++;
        }
      }
      const baseMs = ((performance.now() - baseStart) * LOADS) / BASELINE_LOADS;
      const baseCpuMs = (cpuMs(baseCpu0) * LOADS) / BASELINE_LOADS;
      record({
        case: `dispatch ${LOADS} loads, ${DEPOTS} depots / ${LANES} lanes: end to end (CLI)`,
        engine: best,
        baseline: baseMs,
        unit: 'ms',
        target: 3000,
        note: `baseline: one solve per load (${solves} solves for ${BASELINE_LOADS} loads, scaled x${LOADS / BASELINE_LOADS}; pricing not counted)`,
      });
      // The machine may be shared: CPU time of this process shows the work apart from waiting for a core.
      record({ case: `dispatch ${LOADS} loads: end to end, CPU time of the process`, engine: bestCpu, baseline: baseCpuMs, unit: 'ms', target: 3000 });
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  },
};
