/**
 * Rows the table lists before the user asks for the rest (a design choice, no source): its box shows about
 * eight at a time, and a front of hundreds of rows would be most of the page's layout and paint work when a
 * sweep ends. Every front point also stays on the chart, where clicking it builds it.
 */
export const FRONT_ROWS_FIRST_SHOWN = 40;
