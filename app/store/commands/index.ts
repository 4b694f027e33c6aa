/** Every edit of the design, as verb-first commands (house-style.md, "The editor"). */
export { type Command, type Refusal, refuse, isRefusal, pinKey, splitPinKey, freshId } from './command.ts';
export { connectPins } from './connectPins.ts';
export { disconnectWire } from './disconnectWire.ts';
export { addPart, moveParts, nudgeParts, setPartLabel, setPartRail, setPartProfile, type Move } from './parts.ts';
export { editPart, renamePart, partProblem, designatorProblem } from './partEdit.ts';
export { insertParts } from './paste.ts';
export { setNetLabel, setNetPull, setNetWiringCapacitance, setNetMaxRiseTime } from './nets.ts';
export {
  addWaiver,
  removeWaiverFor,
  removeWaiverAt,
  covers,
  waiverPlaceOf,
  type WaiverPlace,
  type WaiverTarget,
} from './waivers.ts';
export {
  addProfile,
  setProfileLabel,
  setProfileSource,
  setProfileParam,
  deleteProfile,
  localProfileId,
} from './profiles.ts';
export { addRail, setRailLabel, setRailVoltage, setRailTolerance, setRailColour, deleteRail } from './rails.ts';
export {
  addPowerState,
  setPowerStateLabel,
  setRailOff,
  deletePowerState,
  setResetState,
  RESET_STATE_ID,
} from './powerStates.ts';
export { setTitle, replaceDesign, deleteSelection, type Deletion } from './design.ts';
export { netWires, wireGroups, wireId, parseWireId, type Pair } from './netGraph.ts';
export { addDiscrete, setDiscrete, removeDiscrete, newDiscrete, takenIds, DISCRETE_PREFIX } from './discretes.ts';
export { tidyLayout, tidyPositions, TIDY_GAP } from './tidyLayout.ts';
