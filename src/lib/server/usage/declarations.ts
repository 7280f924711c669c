/**
 * An XML bomb or an external entity needs a document type declaration (`<!DOCTYPE … [<!ENTITY …>]>`)
 * to declare its entities; Green Button files never carry one. Told from the bytes on the main thread,
 * such a file costs no worker; the parser in the worker checks the decoded text again.
 */

export const DECLARES_ENTITIES =
	'The file declares a DOCTYPE or entities, which Green Button files never do; it is refused ' +
	'unread, as such declarations can make a small file expand without end.';

const OPENING = Buffer.from('<!');

/** Whether "<!DOCTYPE" or "<!ENTITY", in any case, appears in the bytes; read in place, not decoded. */
export function declaresEntities(bytes: Uint8Array): boolean {
	const buffer = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
	for (let at = buffer.indexOf(OPENING); at >= 0; at = buffer.indexOf(OPENING, at + 2)) {
		const word = buffer.toString('latin1', at + 2, at + 9).toUpperCase();
		if (word === 'DOCTYPE' || word.startsWith('ENTITY')) return true;
	}
	return false;
}
