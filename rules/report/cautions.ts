/**
 * What every report says about its own limits (rules-catalogue.md, "Cautions the report
 * always carries"), in the project's words. Every report and every rendering carries them.
 */
export const CAUTIONS: readonly string[] = Object.freeze([
  'Railcross is a planning aid: its verdicts are only as good as the numbers in the design and its profiles.',
  'It does not know the datasheet values of the parts finally chosen, their behaviour over temperature, ' +
    'transmission-line effects (reflections, ringing) on long or fast wiring, or ground offsets between boards; ' +
    'mains-connected and high-energy circuits are outside its scope altogether.',
  'Confirm every interface against the datasheets of the chosen parts before building, and follow local codes ' +
    'and licensed practice for anything that could hurt someone.',
]);
