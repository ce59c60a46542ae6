/** The width every terminal table and footnote keeps to (project choice: a common terminal width). */
export const TERMINAL_COLUMNS = 100;
