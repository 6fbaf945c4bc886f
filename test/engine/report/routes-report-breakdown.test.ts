// The per-route breakdown: components summed along the lanes used (worked out by hand below), the
// distance and drive time, and the driving-limit flag with its caution.

import { ROUTE_CAUTION } from '../../../engine/text/cautions';
import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { routesReport } from '../../../engine/report/routes-report';
import { cheapestRoutes } from '../../../engine/routes/cheapest-routes';

const depots = 'id,name,lat,lon\nA,a,50,4\nB,b,50.5,4.5\nC,c,51,5\n';
const lanes = 'from,to,ref,toll,fuel,fees,rebate,distance_km,drive_minutes\nA,B,L1,10.00,20.00,5.00,2.50,300,280\nB,C,L2,1.10,2.20,0.30,0.00,250.5,270\nA,C,L3,100,0,0,0,400,300\n';

describe('routes report breakdown', () => {
  it('sums tolls, fuel, fees, rebates, distance and drive time along the route', () => {
    const r = importNetwork(depots, lanes);
    const report = routesReport(r.network!, cheapestRoutes(r.network!, 0), { driveLimitMinutes: 540 });
    const c = report.depots.find((d) => d.id === 'C')!;
    // A>B>C: 32.50 + 3.60 = 36.10 beats A>C at 100.00.
    expect(c.cost).toBe('36.10');
    expect(c.refs).toEqual(['L1', 'L2']);
    expect(c.breakdown).toMatchObject({ toll: '11.10', fuel: '22.20', fees: '5.30', rebate: '2.50', distance_km: 550.5, drive_minutes: 550, over_drive_limit: true });
    expect(report.over_drive_limit).toBe(1);
    expect(report.drive_limit_caution).toMatch(/estimate/);
    expect(report.caution).toBe(ROUTE_CAUTION);
    const b = report.depots.find((d) => d.id === 'B')!;
    expect(b.breakdown!.over_drive_limit).toBe(false);
    // US limit (11 h = 660 min): nothing is over.
    const us = routesReport(r.network!, cheapestRoutes(r.network!, 0), { driveLimitMinutes: 660 });
    expect(us.over_drive_limit).toBe(0);
    expect(us.drive_limit_caution).toBeNull();
    expect(us.caution).toBe(ROUTE_CAUTION); // the route caution is never null
  });
});
