import { describe, expect, it } from 'vitest';
import { cloneDoc } from './doc';
import { diffDocs } from './diff';
import { workedExample } from './templates';

describe('what differs between two drafts', () => {
	it('nothing for the same draft', () => {
		const d = workedExample('heat-pump-hp410')!.build();
		expect(diffDocs(d, cloneDoc(d))).toEqual([]);
	});

	it('legs matched by id: a changed target, a moved leg, an added and a deleted one, the title block', () => {
		const a = workedExample('heat-pump-hp410')!.build();
		const b = cloneDoc(a);
		b.spec.legs[0].target = { P: 1_600_000 };
		const [moved] = b.spec.legs.splice(3, 1);
		b.spec.legs.splice(1, 0, moved);
		b.spec.legs.splice(2, 1); // delete the condensing leg
		b.spec.legs.push({ id: 'Lnew234', process: 'isothermal', target: { v: 0.1 } });
		b.titleBlock.tag = 'HP-411';
		const rows = diffDocs(a, b);
		const find = (section: string, field: string) =>
			rows.find((r) => r.section === section && r.field === field);
		expect(find('Leg L1', 'target')).toMatchObject({
			a: 'P = 1400.0\u00a0kPa a',
			b: 'P = 1600.0\u00a0kPa a'
		});
		expect(find('Leg L4 → L2', 'position')).toMatchObject({ a: 'L4', b: 'L2' });
		expect(find('Leg L2', 'deleted')?.a).toContain('isobaric');
		expect(find('Leg L4', 'added')?.b).toContain('isothermal');
		expect(find('Title block', 'Tag')).toMatchObject({ a: 'HP-410', b: 'HP-411' });
	});

	it('a start by fill level and a leg to saturation read as such', () => {
		const a = workedExample('vessel-v204-fire')!.build();
		const b = cloneDoc(a);
		b.startSpec = { kind: 'fill', fraction: 0.8, T: 293.15 };
		b.spec.legs[0] = { ...b.spec.legs[0], target: { x: 0 }, to: 'saturation' };
		const rows = diffDocs(a, b);
		expect(rows.find((r) => r.section === 'Start state S1')?.b).toBe(
			'fill 80\u00a0% liquid by volume at 20.00\u00a0°C'
		);
		expect(rows.find((r) => r.section === 'Leg L1' && r.field === 'target')?.b).toBe(
			'saturation (liquid line)'
		);
	});
});
