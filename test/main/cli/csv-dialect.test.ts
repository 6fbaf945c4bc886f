// --csv-dialect: routes and export write semicolon, decimal-comma, BOM files that read back with the
// importer (lanes) and with papaparse itself (routes: "Liège" intact); an unknown dialect is a usage
// error (exit 2) naming the option; the default stays RFC 4180.

// The output is read with papaparse itself, as an outside reader (tests may import it directly).
import Papa from 'papaparse';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { importNetwork } from '../../../engine/planning/import-network';
import { runCli, tempFiles } from './cli-harness';

const depots = 'id,name,lat,lon\nLGG,Liège Trilogiport,50.683,5.66\nAAC,Aachen,50.776,6.084\n';
const lanes = 'from,to,ref,toll,fuel,fees,rebate,currency,distance_km,drive_minutes\nLGG,AAC,L-1,12.50,45.10,3.05,0.00,EUR,54.3,48\nAAC,LGG,L-2,0.00,44.90,0.00,1.25,EUR,54.3,50\n';
const dir = tempFiles({ 'depots.csv': depots, 'lanes.csv': lanes });
const base = ['--depots', join(dir, 'depots.csv'), '--lanes', join(dir, 'lanes.csv'), '--date', '2026-08-15'];

describe('--csv-dialect', () => {
  it('writes routes as semicolon, decimal comma and BOM; papaparse reads them with Liège intact', async () => {
    const { status, stdout } = await runCli(['routes', ...base, '--from', 'AAC', '--csv-dialect', 'semicolon']);
    expect(status).toBe(0);
    expect(stdout.charCodeAt(0)).toBe(0xfeff);
    const rows = Papa.parse<string[]>(stdout.slice(1), { delimiter: ';' }).data;
    const at = (name: string) => rows[0].indexOf(name);
    const liege = rows.find((r) => r[at('id')] === 'LGG')!;
    expect(liege[at('name')]).toBe('Liège Trilogiport');
    expect(liege[at('cost')]).toBe('43,65'); // 0.00 + 44.90 + 0.00 - 1.25
  });

  it('exports lanes that read back with the importer to the same network', async () => {
    const out = join(dir, 'lanes-eu.csv');
    const { status } = await runCli(['export', ...base, '--lanes-out', out, '--csv-dialect', 'semicolon,comma,bom']);
    expect(status).toBe(0);
    const text = readFileSync(out, 'utf8');
    expect(text.charCodeAt(0)).toBe(0xfeff);
    const first = importNetwork(depots, lanes, { plan: { date: '2026-08-15' } }).network!;
    const again = importNetwork(depots, text, { plan: { date: '2026-08-15' } });
    expect(again.report.errors).toEqual([]);
    expect(Array.from(again.network!.laneNet)).toEqual(Array.from(first.laneNet));
  });

  it('refuses a dialect it does not know, and writes RFC 4180 without the option', async () => {
    const bad = await runCli(['routes', ...base, '--from', 'AAC', '--csv-dialect', 'tab']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/--csv-dialect: "tab" is not a dialect/);
    const plain = await runCli(['routes', ...base, '--from', 'AAC']);
    expect(plain.stdout.charCodeAt(0)).not.toBe(0xfeff);
    expect(plain.stdout).toContain('43.65');
  });

  it('prints the caution beside every routes CSV on stderr, and puts it in the JSON even with a rebate loop', async () => {
    const plain = await runCli(['routes', ...base, '--from', 'AAC']);
    expect(plain.stderr).toMatch(/^CAUTION: Cost estimate only\./m);
    const loopLanes = 'from,to,toll,fuel,fees,rebate,currency\nLGG,AAC,1.00,0,0,5.00,EUR\nAAC,LGG,1.00,0,0,0,EUR\n';
    const loopDir = tempFiles({ 'depots.csv': depots, 'lanes.csv': loopLanes });
    const json = await runCli(['routes', '--depots', join(loopDir, 'depots.csv'), '--lanes', join(loopDir, 'lanes.csv'), '--date', '2026-08-15', '--from', 'AAC', '--json']);
    const report = JSON.parse(json.stdout) as { loops: unknown[]; caution: string | null };
    expect(report.loops.length).toBeGreaterThan(0);
    expect(report.caution).toMatch(/estimate/i);
  });
});
