/**
 * Marks for the sheet's print stylesheet (print-styles.web.tsx), spread on a
 * view: react-native-web turns `dataSet` into `data-*` attributes; devices
 * ignore it. Not in React Native's prop types, hence plain objects.
 */
export const printSheetMark = { dataSet: { printSheet: 'sheet' } } as const;

/** On screen only: buttons, links and settings inside the sheet. */
export const screenOnlyMark = { dataSet: { print: 'hide' } } as const;

/** On paper only: e.g. the order's facts that the page header shows on screen. */
export const paperOnlyMark = { dataSet: { print: 'only' } } as const;

/**
 * A fill that carries meaning on paper (the zone diagram's doping shading):
 * kept, and printed exactly, where every other background is dropped.
 */
export const keepFillMark = { dataSet: { printFill: 'keep' } } as const;
