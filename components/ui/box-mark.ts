/**
 * Marks a boxed block (a Section, a titled block, a notice) as `data-box`
 * on the web, so the browser layout test can check that no two boxes
 * overlap at any width: react-native-web turns `dataSet` into `data-*`
 * attributes, devices ignore it. Not in React Native's prop types, hence a
 * plain object to spread.
 */
export const boxMark = { dataSet: { box: 'box' } } as const;
