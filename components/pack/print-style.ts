// Printing the change-board pack: only the web prints (print-style.web.ts), so elsewhere there is nothing to do.

/** Adds the pack's print rules; a no-op outside the web. */
export function installPackPrintStyle(): void {}

/** Whether this platform prints the page (the web's print dialog). */
export const CAN_PRINT: boolean = false;

export function printPage(): void {}
