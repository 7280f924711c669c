import { describe, expect, it } from 'vitest';
import { noteText } from './note-text';

// The messages are the core's own (src/lib/calc/urdb-import.ts and its neighbours).
describe('a note of the import', () => {
	it('names its field once when the message already does', () => {
		expect(noteText({ field: 'energycomments', message: 'energycomments is not priced by Runrate' })).toEqual(
			{ field: null, message: 'energycomments is not priced by Runrate' }
		);
	});

	it('puts the field first when the message does not name it', () => {
		expect(noteText({ field: 'riders', message: 'Rider "Fuel": not written' })).toEqual({
			field: 'riders',
			message: 'Rider "Fuel": not written'
		});
	});

	it('does not take a longer word for the field', () => {
		expect(noteText({ field: 'demand', message: 'demandunits in "hp" cannot be priced' }).field).toBe(
			'demand'
		);
	});

	it('prints no field for a note without one', () => {
		expect(noteText({ field: '', message: 'Prices in CAD were written as they are' }).field).toBeNull();
	});
});
