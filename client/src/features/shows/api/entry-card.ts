/** The owner's card for one entry (their own design with the show, class and number), downloaded as a PDF. */
export const entryCardUrl = (entryId: number) => `/api/entries/${entryId}/card.pdf`;
