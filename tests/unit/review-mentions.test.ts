import { describe, expect, it } from 'vitest';
import { mentionedIn, type Mentionable } from '../../src/lib/review/mentions';

// What counts as an @mention: issue 15 ("@mentioning a teammate by name notifies them") and the
// brief's rules: full name or e-mail local part, any case, longest name wins, never inside code,
// never an e-mail address. People from the invented demo world.

const mira: Mentionable = {
	id: 'mira',
	name: 'Mira Castellan',
	email: 'mira.castellan@kittiwake.example'
};
const miraO: Mentionable = { id: 'mira-o', name: 'Mira', email: 'm.okafor@kittiwake.example' };
const jonas: Mentionable = { id: 'jonas', name: 'Jonas Brekke', email: 'jb@kittiwake.example' };
const team = [mira, miraO, jonas];

const ids = (body: string, people = team) => mentionedIn(body, people).map((p) => p.id);

describe('mentionedIn', () => {
	it('finds a full name, in any case and with any spacing', () => {
		expect(ids('@Mira Castellan, is the TBS stable to this?')).toEqual(['mira']);
		expect(ids('ping @mira castellan')).toEqual(['mira']);
		expect(ids('ping @MIRA   CASTELLAN please')).toEqual(['mira']);
		expect(ids('@Mira\nCastellan')).toEqual(['mira']);
	});

	it('finds the local part of an e-mail address', () => {
		expect(ids('@mira.castellan, see step 3.')).toEqual(['mira']);
		expect(ids('(@jb)')).toEqual(['jonas']);
	});

	it('lets the longest name win when names share a start', () => {
		expect(ids('@Mira Castellan')).toEqual(['mira']);
		expect(ids('@Mira, can you check?')).toEqual(['mira-o']);
		expect(ids('@Mira Castellan and @Mira')).toEqual(['mira', 'mira-o']);
	});

	it('needs the whole handle: no longer word, no continued address', () => {
		expect(ids('@Miranda')).toEqual([]);
		expect(ids('@jbx')).toEqual([]);
		expect(ids('@mira.castellan.lab')).toEqual([]);
		expect(ids('@Jonas')).toEqual([]);
	});

	it('accepts ordinary punctuation after a mention', () => {
		expect(ids("@Mira Castellan's route")).toEqual(['mira']);
		expect(ids('Thanks @jb.')).toEqual(['jonas']);
		expect(ids('**@Jonas Brekke**: agreed')).toEqual(['jonas']);
		expect(ids('> @jb wrote this')).toEqual(['jonas']);
		expect(ids('- first\n- @jb second')).toEqual(['jonas']);
	});

	it('ignores inline code and code blocks, fenced or indented', () => {
		expect(ids('Run `notify @jb` later')).toEqual([]);
		expect(ids('```\n@Mira Castellan\n```')).toEqual([]);
		expect(ids('~~~\n@jb\n~~~')).toEqual([]);
		expect(ids('Log:\n\n    @jb said so\n')).toEqual([]);
		expect(ids('`@jb` but @Mira Castellan')).toEqual(['mira']);
	});

	it('does not read an e-mail address as a mention', () => {
		expect(ids('Write to mira.castellan@kittiwake.example')).toEqual([]);
		expect(ids('a@jb.org and x@Mira')).toEqual([]);
		expect(ids('<jb@kittiwake.example>')).toEqual([]);
	});

	it('does not mention on an escaped @ or on people outside the list', () => {
		expect(ids('\\@jb')).toEqual([]);
		expect(ids('@Mira Castellan', [jonas])).toEqual([]);
	});

	it('names each person once, in the order first mentioned', () => {
		expect(ids('@jb then @mira.castellan then @Jonas Brekke again')).toEqual(['jonas', 'mira']);
	});

	it('reads names with letters outside ASCII and characters a pattern would misread', () => {
		const zoe = { id: 'zoe', name: 'Zoë Ødegård', email: 'z+lab@kittiwake.example' };
		expect(ids('@zoë ødegård!', [zoe])).toEqual(['zoe']);
		expect(ids('@z+lab', [zoe])).toEqual(['zoe']);
		expect(ids('@zzlab', [zoe])).toEqual([]);
	});
});
