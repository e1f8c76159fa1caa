/** The triage board's reasons and warnings, worded from their codes and values in each language. */
import { describe, expect, it } from 'vitest';
import { loadTranslations } from '../../server/src/i18n';
import type { Language } from '../../shared/i18n/languages';
import { explainAgain, triage } from '../../shared/triage/engine';
import { checkPlacement, type PlacementWarning } from '../../shared/triage/needs';
import { storedReasons } from '../../shared/triage/run-summary';
import { waitingDetail, type WaitingWhy } from '../../shared/triage/waiting';
import { waitingText, warningText } from '../../client/src/features/triage/wording';

const i18n = loadTranslations();
const t = (lang: Language) => (key: string, values?: Record<string, unknown>) => i18n[lang]._(key, values);
const why = (w: WaitingWhy, lang: Language) => waitingText(w, t(lang), lang);
const warn = (w: PlacementWarning, lang: Language) => warningText(w, t(lang), lang);

const reasons: WaitingWhy[] = [
  { reason: 'no-skill', skill: 'toys', level: 1 },
  { reason: 'no-equipment', missing: ['hot-air-station', 'bike-stand'], kit: ['hot-air-station', 'bike-stand'] },
  { reason: 'no-equipment', missing: [], kit: ['soldering-station', 'multimeter'] },
  { reason: 'no-pair', skill: 'electronics', fixers: ['Gus', 'Ada'], kit: ['soldering-station'] },
  { reason: 'no-pair', skill: 'electronics', fixers: ['Gus'], kit: ['soldering-station'] },
  { reason: 'capacity' },
  { reason: 'capacity', allDay: true },
];
const warnings: PlacementWarning[] = [
  { code: 'missing-skill', fixer: 'Wren', skill: 'electronics' },
  { code: 'low-level', fixer: 'Wren', skill: 'phones', level: 1, need: 2 },
  { code: 'missing-equipment', bench: 'Sewing table', missing: ['soldering-station', 'multimeter'] },
  { code: 'seated-elsewhere', fixer: 'Wren' },
  { code: 'over-capacity', fixer: 'Wren', n: 2 },
  { code: 'bench-full', bench: 'Sewing table', seats: 3 },
  { code: 'gone' },
];

describe('why an item waits, in four languages', () => {
  it('says it in English as the engine’s record does', () => {
    expect(why(reasons[0], 'en')).toBe(waitingDetail(reasons[0]));
    expect(why(reasons[1], 'en')).toBe('No bench has a hot-air station and bike stand.');
    expect(why(reasons[2], 'en')).toBe('No single bench has all of: soldering station and multimeter.');
    expect(why(reasons[3], 'en')).toBe(
      'Gus and Ada have the electronics skill but are seated at a bench without soldering station; move a fixer or the kit.',
    );
    expect(why(reasons[4], 'en')).toBe(waitingDetail(reasons[4]));
    expect(why(reasons[5], 'en')).toBe(waitingDetail(reasons[5]));
    expect(why(reasons[6], 'en')).toBe(waitingDetail(reasons[6]));
  });

  it('says it in Dutch, German and French, with the translated skill and kit and the language’s lists', () => {
    expect(reasons.map((r) => why(r, 'nl'))).toEqual([
      'Niemand hier heeft de vaardigheid ‘speelgoed’ op niveau 1 (lerend) of hoger.',
      'Geen enkele werkbank heeft dit gereedschap: heteluchtstation en fietsmontagestandaard.',
      'Geen enkele werkbank heeft dit allemaal tegelijk: soldeerstation en multimeter.',
      'Gus en Ada hebben de vaardigheid ‘elektronica’, maar hebben een vaste plek aan een werkbank zonder soldeerstation; verplaats een reparateur of het gereedschap.',
      'Gus heeft de vaardigheid ‘elektronica’, maar heeft een vaste plek aan een werkbank zonder soldeerstation; verplaats een reparateur of het gereedschap.',
      'Er zijn een reparateur en een werkbank voor, maar die zijn bezig met andere voorwerpen (eerder aan de beurt, of daar vastgezet); het wacht op de volgende ronde.',
      'Elke reparateur en werkbank die het zou kunnen nemen, is bezet in elk tijdvak vanaf de boeking tot sluitingstijd.',
    ]);
    expect(reasons.map((r) => why(r, 'de'))).toEqual([
      'Niemand hier hat die Fähigkeit „Spielzeug“ auf Stufe 1 (lernend) oder höher.',
      'Keine Werkbank hat diese Ausrüstung: Heißluftstation und Fahrradmontageständer.',
      'Keine einzelne Werkbank hat all das zugleich: Lötstation und Multimeter.',
      'Gus und Ada haben die Fähigkeit „Elektronik“, sitzen aber fest an einer Werkbank ohne Lötstation; setzen Sie einen Reparateur um oder bringen Sie die Ausrüstung dorthin.',
      'Gus hat die Fähigkeit „Elektronik“, sitzt aber fest an einer Werkbank ohne Lötstation; setzen Sie einen Reparateur um oder bringen Sie die Ausrüstung dorthin.',
      'Es gibt einen Reparateur und eine Werkbank dafür, aber beide sind mit anderen Gegenständen beschäftigt (die zuerst drankommen oder dort fixiert sind); er wartet auf die nächste Runde.',
      'Jeder Reparateur und jede Werkbank, die ihn übernehmen könnten, sind in jedem Zeitfenster von seiner Buchung bis zum Schluss belegt.',
    ]);
    expect(reasons.map((r) => why(r, 'fr'))).toEqual([
      'Personne ici n’a la compétence « jouets » au niveau 1 (en apprentissage) ou au-dessus.',
      'Aucun établi n’a cet équipement : station à air chaud et pied d’atelier vélo.',
      'Aucun établi n’a tout cela à la fois : station de soudage et multimètre.',
      'Gus et Ada ont la compétence « électronique », mais ont leur place à un établi sans station de soudage ; déplacez un réparateur ou l’équipement.',
      'Gus a la compétence « électronique », mais a sa place à un établi sans station de soudage ; déplacez un réparateur ou l’équipement.',
      'Un réparateur et un établi existent pour lui, mais ils sont pris par d’autres objets (servis avant, ou verrouillés là) ; il attend le tour suivant.',
      'Chaque réparateur et chaque établi qui pourraient le prendre sont occupés à chaque créneau, de sa réservation jusqu’à la fermeture.',
    ]);
  });

  it('names a skill or kit the catalogs do not know by its stored label', () => {
    expect(why({ reason: 'no-skill', skill: 'clocks', level: 3 }, 'de')).toBe(
      'Niemand hier hat die Fähigkeit „clocks“ auf Stufe 3 (Experte) oder höher.',
    );
    expect(why({ reason: 'no-equipment', missing: ['lathe'], kit: ['lathe'] }, 'fr')).toBe(
      'Aucun établi n’a cet équipement : lathe.',
    );
  });
});

describe('the engine gives the code and values beside its English record', () => {
  it('keeps the values a sentence needs, and says the same again from a stored round', () => {
    const round = {
      items: [
        { id: 'sew', skill: 'textiles', minLevel: 1 as const, equipment: [], priority: 1 },
        { id: 'amp', skill: 'electronics', minLevel: 2 as const, equipment: ['soldering-station'], priority: 2 },
      ],
      volunteers: [{ id: 'gus', name: 'Gus', skills: { electronics: 3 as const }, benchId: 'plain' }],
      benches: [
        { id: 'plain', equipment: ['multimeter'], seats: 3 },
        { id: 'solder', equipment: ['soldering-station'], seats: 1 },
      ],
    };
    const out = triage(round);
    expect(out.unassigned).toEqual([
      { itemId: 'sew', reason: 'no-skill', skill: 'textiles', level: 1, detail: expect.stringContaining('textiles') },
      {
        itemId: 'amp',
        reason: 'no-pair',
        skill: 'electronics',
        fixers: ['Gus'],
        kit: ['soldering-station'],
        detail: expect.stringContaining('Gus has'),
      },
    ]);
    // A run stored before reasons kept their values: its reasons are worked out again from its input.
    const old = out.unassigned.map((u) => ({ itemId: u.itemId, reason: u.reason, detail: u.detail }));
    const whyOf = storedReasons(round);
    expect(old.map(whyOf)).toEqual(out.unassigned.map(({ itemId, detail, ...w }) => (void itemId, void detail, w)));
    expect(explainAgain(round, 'nope')).toBeNull();
    expect(whyOf({ itemId: 'x', reason: 'capacity', detail: 'Busy.' })).toEqual({ reason: 'capacity' });
  });
});

describe('the rules a hand-made move breaks, in four languages', () => {
  it('gives codes and values, not sentences', () => {
    const w = checkPlacement(
      { skill: 'electronics', minLevel: 2, equipment: ['soldering-station'] },
      { name: 'Wren', skills: { textiles: 3 }, benchId: 9, capacity: 1, assigned: 1 },
      { id: 5, name: 'Sewing table', equipment: ['sewing-machine'], seats: 1, assigned: 1 },
    );
    expect(w).toEqual([
      { code: 'missing-skill', fixer: 'Wren', skill: 'electronics' },
      { code: 'missing-equipment', bench: 'Sewing table', missing: ['soldering-station'] },
      { code: 'seated-elsewhere', fixer: 'Wren' },
      { code: 'over-capacity', fixer: 'Wren', n: 1 },
      { code: 'bench-full', bench: 'Sewing table', seats: 1 },
    ]);
  });

  it('words each warning in English, Dutch, German and French', () => {
    expect(warnings.map((w) => warn(w, 'en'))).toEqual([
      'Wren has no electronics skill.',
      'Wren is at phones and tablets level 1; this item needs level 2.',
      'Sewing table has no soldering station and multimeter.',
      'Wren is seated at another bench.',
      'Wren already has 2 items.',
      'Sewing table has all 3 seats taken.',
      'The fixer is no longer coming or the bench was removed.',
    ]);
    expect(warnings.map((w) => warn(w, 'nl'))).toEqual([
      'Wren heeft de vaardigheid ‘elektronica’ niet.',
      'Wren zit voor ‘telefoons en tablets’ op niveau 1; dit voorwerp vraagt niveau 2.',
      'Werkbank ‘Sewing table’ heeft geen soldeerstation en multimeter.',
      'Wren heeft een vaste plek aan een andere werkbank.',
      'Wren heeft al 2 voorwerpen.',
      'Bij werkbank ‘Sewing table’ zijn alle 3 plaatsen bezet.',
      'De reparateur komt niet meer, of de werkbank is weggehaald.',
    ]);
    expect(warnings.map((w) => warn(w, 'de'))).toEqual([
      'Wren hat die Fähigkeit „Elektronik“ nicht.',
      'Wren ist bei „Handys und Tablets“ auf Stufe 1; dieser Gegenstand braucht Stufe 2.',
      'An der Werkbank „Sewing table“ fehlt: Lötstation und Multimeter.',
      'Wren sitzt fest an einer anderen Werkbank.',
      'Wren hat schon 2 Gegenstände.',
      'An der Werkbank „Sewing table“ sind alle 3 Plätze belegt.',
      'Der Reparateur kommt nicht mehr, oder die Werkbank wurde entfernt.',
    ]);
    expect(warnings.map((w) => warn(w, 'fr'))).toEqual([
      'Wren n’a pas la compétence « électronique ».',
      'Wren est au niveau 1 en « téléphones et tablettes » ; cet objet demande le niveau 2.',
      'Il manque à l’établi « Sewing table » : station de soudage et multimètre.',
      'Wren a sa place à un autre établi.',
      'Wren a déjà 2 objets.',
      'À l’établi « Sewing table », les 3 places sont prises.',
      'Le réparateur ne vient plus, ou l’établi a été retiré.',
    ]);
  });

  it('counts one item, one seat and one missing kind in the singular', () => {
    const one: PlacementWarning[] = [
      { code: 'over-capacity', fixer: 'Wren', n: 1 },
      { code: 'bench-full', bench: 'Bench 2', seats: 1 },
      { code: 'missing-equipment', bench: 'Bench 2', missing: ['multimeter'] },
    ];
    expect(one.map((w) => warn(w, 'en'))).toEqual([
      'Wren already has 1 item.',
      'Bench 2 has its only seat taken.',
      'Bench 2 has no multimeter.',
    ]);
    expect(one.map((w) => warn(w, 'de'))).toEqual([
      'Wren hat schon 1 Gegenstand.',
      'An der Werkbank „Bench 2“ ist der einzige Platz belegt.',
      'An der Werkbank „Bench 2“ fehlt: Multimeter.',
    ]);
    expect(one.map((w) => warn(w, 'fr'))[1]).toBe('À l’établi « Bench 2 », la seule place est prise.');
    expect(one.map((w) => warn(w, 'nl'))[1]).toBe('Bij werkbank ‘Bench 2’ is de enige plaats bezet.');
  });
});
