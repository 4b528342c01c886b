// What to check, per rule. Written for whoever reads the message on a phone in the yard: short, concrete.
import type { AlertRule } from '../../../shared/alerts/rules';

/**
 * Cautions that go with any advice to add heat. Sources: U.S. CPSC news release "CPSC Warns of Hazards from
 * Furnaces, Space Heaters and Fireplaces" (14 Dec 2005): choose heaters certified by a recognised testing
 * laboratory, keep them clear of anything that burns, fuel-burning heaters can cause carbon-monoxide poisoning
 * through poor venting; CPSC release of 21 Nov 1978 on unvented gas-fired space heaters (CO deaths in
 * poorly ventilated rooms). Codes: common practice.
 */
export const HEATING_CAUTIONS = [
  'Use only a heater rated for the space it stands in (a garage or damp cellar needs one made for it), and keep it clear of boxes, packing and bedding.',
  'Never run an unvented fuel-burning heater (kerosene, propane, gas) in a closed room: it fills the room with carbon monoxide, which you cannot smell.',
  'Follow your local electrical and fire codes: no overloaded extension leads, no heater left where it can tip onto packing.',
];

export const ADVICE: Record<AlertRule, string[]> = {
  freeze_risk: [
    'Go and look: a door or vent left open, a heater that tripped, a thermostat turned down.',
    'Move the batches at stake to a warmer room, or cover and insulate their boxes if they cannot move.',
    'If you add heat, read the cautions below first.',
  ],
  out_of_band: [
    'Open the room chart and see when it left the band and how far.',
    'If the room cannot hold the band, move the batch to one that can.',
  ],
  storage_warm: [
    'Check the cooling: the fridge door and its power, a heater left on, sun on the wall.',
    'Warm storage lets buds push before planting out; move cold-stored batches somewhere cooler if the room cannot be cooled.',
  ],
  silent_logger: [
    'Check the logger: battery, its place in the room, whether it is still recording.',
    'Check the nightly import (the script and its API token), or upload the file by hand on the import page.',
  ],
  exposure_budget: [
    'Look at the batch\'s exposure record: when and where it took the degree-hours.',
    'Plan a check of the unions before planting out, and keep the batch in a steadier room.',
  ],
};
