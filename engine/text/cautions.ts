// The cautions and about text, in one place so the Electron main process, the renderer and the
// README-facing screens all say the same words. Pure strings: no DOM, no Node.

/** Product name as shown in window titles, dialogs and the about box. */
export const PRODUCT_NAME = 'Lanewright';

/** One-line description of what the tool does. */
export const PRODUCT_TAGLINE = 'Toll-and-rebate route planning for freight dispatch.';

/** The cautions, one sentence each, in the order they are shown. */
export const CAUTIONS: readonly string[] = [
  'Results are cost estimates built from the lane files you load; they are not quotes, invoices or contract terms.',
  'Vehicle restrictions apply and are not checked here: height, weight, axle load and hazardous goods.',
  'Driver hours rules and local regulations apply to every route.',
  'Defer to local codes, the carrier\'s own procedures and licensed professional practice before dispatching.',
];

/** Short form shown wherever one route and its cost are shown; the about box has the full list. */
export const ROUTE_CAUTION =
  'Cost estimate only. Vehicle restrictions (height, weight, axle load, hazardous goods), driver hours and local regulations apply: check them before dispatching.';

/** With every contract review (audit, fix plan, headroom): the figures are estimates, not terms. */
export const REVIEW_CAUTION =
  'Fix plans and headroom are estimates from the loaded lane costs; any change to contract terms still needs the usual commercial and legal review. ' +
  ROUTE_CAUTION;

/** One line in the map's attribution corner (kept short: the corner shares the map with the key). */
export const MAP_CAUTION = 'Costs are estimates; vehicle restrictions, driver hours and local regulations apply.';

/** Shown with every dispatch plan (CLI output, Loads panel, each page of the printed dispatch sheet). */
export const DISPATCH_CAUTION =
  'Cost estimates only. Vehicle limits are checked only against the lane limits in your files (height, width, length, ' +
  'weight, axle load, ADR tunnel category, dangerous-goods bans); road signs, permits, local restrictions, driver hours ' +
  'and regulations apply: check every route before dispatching and defer to local codes and licensed practice.';

/** Heading of the notice shown the first time the app opens. */
export const FIRST_RUN_TITLE = 'Before you plan';

/** Lead-in of the first-run notice, before the list of cautions. */
export const FIRST_RUN_LEAD =
  'Lanewright compares lane costs, tolls, fuel, fees and rebates to find the cheapest routes between depots ' +
  'and to flag rebate terms that cannot be right. Please keep in mind:';

/** Body of the first-run notice as plain text: the lead-in followed by every caution. */
export const FIRST_RUN_NOTICE = `${FIRST_RUN_LEAD}\n\n` + CAUTIONS.map((line) => `- ${line}`).join('\n');

/** Label of the button that closes the first-run notice. */
export const FIRST_RUN_ACKNOWLEDGE = 'I understand';

/** Body of the about dialog; `version` is the app version, shown on the first line. */
export function aboutText(version: string): string {
  return `${PRODUCT_NAME} ${version}\n${PRODUCT_TAGLINE}\n\n` + CAUTIONS.join('\n');
}

/** Notice on the demo data, so nobody mistakes it for a real carrier or contract. */
export const SAMPLE_DATA_NOTICE =
  'The sample carrier is the fictional Brightwater & Fennick Haulage; its depots sit in real cities but its lanes, tolls and rebates are invented.';
