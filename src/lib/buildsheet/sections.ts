import * as fmt from './format';
import { designField } from '../design/registry';
import { METRES_PER_INCH } from '../format/length';
import { BANK_NOTES, COATING_NOTES, SAFETY_CHECKLIST, SOLID_STATE_NOTES, transformerProtectionNotes, WINDING_NOTES, type SheetNote } from './notes';
import type { BuildSheet } from './sheet';

export interface SheetRow {
  label: string;
  value: string;
  note?: string;
}

export interface SheetTable {
  columns: string[];
  rows: string[][];
}

export type SheetCaution = 'stored-energy' | 'supply' | 'bus' | 'rf' | 'general';

export interface SheetSection {
  id: string;
  title: string;
  rows: SheetRow[];
  table?: SheetTable;
  notes?: readonly SheetNote[];
  list?: readonly string[];
  caution?: SheetCaution;
}

const INSULATION: Record<string, string> = { bare: 'bare', single: 'single build', heavy: 'heavy build' };

/** The sheet as display sections, shared word for word by the web page and the PDF. */
export function sheetSections(sheet: BuildSheet): SheetSection[] {
  const s = sheet.secondary;
  const o = sheet.options;
  const wire = s.awg !== null ? `${s.awg} AWG, ${INSULATION[s.insulation ?? 'bare']} enamel` : `${fmt.lengthFine(s.wireDiameter)} bare`;
  const out: SheetSection[] = [
    {
      id: 'secondary',
      title: 'Secondary: form and winding',
      rows: [
        { label: 'Form outside diameter', value: fmt.lengthShort(s.formDiameter) },
        { label: 'Form length to cut', value: fmt.lengthShort(s.formLength), note: `winding + ${fmt.lengthShort(o.endMargin)} bare form at each end (at least 1 in; R. Quick, COILBLD1, cuts the form about 3 in longer than the winding)` },
        { label: 'Winding length', value: fmt.lengthShort(s.windingLength) },
        { label: 'Turns', value: String(s.turns) },
        { label: 'Wire', value: wire, note: `${fmt.lengthFine(s.insulatedDiameter)} over the enamel` },
        { label: 'Turns per length', value: `${fmt.sig(s.turnsPerMetre / 100, 4)} per cm (${fmt.sig(s.turnsPerMetre * METRES_PER_INCH, 4)} per in)`, note: `pitch ${fmt.lengthFine(s.pitch)}` },
        { label: 'Wire length (computed)', value: fmt.lengthLong(s.wireLength) },
        ...(s.quarterWaveFrequency !== null
          ? [
              {
                label: 'Quarter-wave figure of this wire, c / (4 × length)',
                value: fmt.frequency(s.quarterWaveFrequency),
                note: `for comparison only: the wound coil resonates at ${fmt.frequency(s.bareFrequency)} without topload (${fmt.sig(s.bareFrequency / s.quarterWaveFrequency, 3)} ×), because winding the wire into a solenoid changes the wave speed along it; see /methods`,
              },
            ]
          : []),
        { label: 'Wire to buy', value: fmt.lengthLong(s.wireToBuy), note: `with ${fmt.percent(o.margin, 0)} extra for leads and mistakes` },
        { label: 'Copper mass (computed)', value: fmt.mass(s.wireMass) },
        { label: 'Copper mass to buy', value: fmt.mass(s.massToBuy) },
        {
          label: 'Spool',
          value: `${s.spoolMetric.count} × ${s.spoolMetric.size} kg or ${s.spoolImperial.count} × ${s.spoolImperial.size} lb`,
          note: 'common spool sizes (common practice); one continuous length avoids a splice',
        },
        { label: 'Winding time', value: fmt.duration(s.windingTime), note: `${s.turns} turns at ${fmt.plain(o.rpm, 4)} rpm, without set-up or stops` },
        { label: 'DC resistance', value: fmt.resistance(s.dcResistance), note: 'check with an ohmmeter after winding' },
      ],
      notes: WINDING_NOTES,
    },
    {
      id: 'checkpoints',
      title: `Turn-count checkpoints (every ${o.every} turns)`,
      rows: [],
      table: {
        columns: ['Turns', 'Height of winding', 'Mark from form end'],
        rows: s.checkpoints.map((c) => [String(c.turns), fmt.lengthShort(c.height), fmt.lengthShort(c.heightFromFormEnd)]),
      },
    },
    { id: 'coating', title: 'Coating and sealing', rows: [], notes: COATING_NOTES },
  ];

  const tl = sheet.topload;
  if (tl) {
    const rows: SheetRow[] =
      tl.shape === 'toroid'
        ? [
            { label: 'Shape', value: 'toroid' },
            { label: 'Overall diameter', value: fmt.lengthShort(tl.majorDiameter!) },
            { label: 'Tube diameter', value: fmt.lengthShort(tl.minorDiameter!), note: 'duct or spun tube of this cross-section' },
            { label: 'Ring centre-line diameter', value: fmt.lengthShort(tl.majorDiameter! - tl.minorDiameter!), note: 'where to bend the tube' },
          ]
        : [
            { label: 'Shape', value: 'sphere' },
            { label: 'Diameter', value: fmt.lengthShort(tl.diameter!) },
          ];
    rows.push({ label: 'Centre above the top turn', value: fmt.lengthShort(tl.elevation), note: 'from the top turn to the topload centre' });
    if (tl.capacitance !== null) rows.push({ label: 'Capacitance (computed)', value: fmt.capacitance(tl.capacitance) });
    out.push({ id: 'topload', title: 'Topload', rows });
  }

  const p = sheet.primary;
  if (p) {
    const rows: SheetRow[] = [
      { label: 'Shape', value: `${p.shape}, ${fmt.plain(p.turns, 4)} turns of ${fmt.lengthShort(p.conductorDiameter)} conductor` },
      { label: designField('primary.innerDiameter').label, value: fmt.lengthShort(p.innerDiameter), note: 'centre line of the conductor' },
      { label: 'Gap between turns', value: fmt.lengthShort(p.spacing), note: 'between conductor surfaces' },
      { label: 'Outside diameter', value: fmt.lengthShort(p.outerDiameter), note: 'over the conductor of the outermost turn' },
      { label: 'Innermost turn above the primary plane', value: fmt.lengthShort(p.elevation) },
      ...(p.angle !== null ? [{ label: designField('primary.angle').label, value: `${fmt.plain((p.angle * 180) / Math.PI, 3)}°` }] : []),
      { label: 'Conductor length (all turns)', value: fmt.lengthLong(p.conductorLength) },
      { label: 'Conductor to buy', value: fmt.lengthLong(p.conductorToBuy), note: `with ${fmt.percent(o.margin, 0)} extra; add the leads to the tank and gap` },
    ];
    if (p.tapTurns !== null) {
      rows.push({
        label: 'Tap to set (predicted)',
        value: `${fmt.sig(p.tapTurns, 4)} turns from the inner end (${fmt.tapPosition(p.tapTurns)})`,
        note: p.targetFrequency !== null ? `tunes the primary to ${fmt.frequency(p.targetFrequency)}` : undefined,
      });
      if (p.conductorLengthAtTap !== null) rows.push({ label: 'Conductor to the tap', value: fmt.lengthLong(p.conductorLengthAtTap) });
    } else rows.push({ label: 'Tap to set (predicted)', value: 'none: the primary cannot reach the target frequency' });
    if (p.calibrated) {
      rows.push({
        label: 'Tap for the adopted measurements',
        value:
          p.calibrated.tapTurns !== null
            ? `${fmt.sig(p.calibrated.tapTurns, 4)} turns from the inner end (${fmt.tapPosition(p.calibrated.tapTurns)})`
            : 'none: out of the primary’s range',
        note: `aims at ${fmt.frequency(p.calibrated.targetFrequency)} with ${fmt.capacitance(p.calibrated.tankCapacitance)}`,
      });
    }
    rows.push({ label: 'Tuning practice', value: 'start a little low; try taps either side a fraction of a turn at a time at low power', note: 'hvtesla.com/tuning.html; TCML 2001/May/msg00905' });
    out.push({ id: 'primary', title: 'Primary', rows });
  }

  const d = sheet.drive;
  const t = sheet.tank;
  if (t) {
    const rows: SheetRow[] = [{ label: 'Tank capacitance', value: fmt.capacitance(t.capacitance) }];
    if (t.energyAtSupplyPeak !== null) rows.push({ label: 'Stored energy at supply peak', value: fmt.energy(t.energyAtSupplyPeak), note: '½CV²: potentially lethal' });
    const b = t.bank;
    if (b) {
      rows.push(
        {
          label: b.suggested ? 'Suggested bank' : 'Bank layout',
          value: `${b.series} in series × ${b.parallel} strings = ${b.units} units of ${fmt.capacitance(b.unitCapacitance)} / ${fmt.voltage(b.unitVoltage)}`,
          note: b.suggested ? `from the common 0.15 µF / 2 kV pulse capacitor; gives ${fmt.capacitance(b.capacitance)}` : undefined,
        },
        { label: 'String voltage rating', value: fmt.voltage(b.voltageRating), note: b.ratingMargin !== null ? `${fmt.sig(b.ratingMargin, 3)} × the supply peak (aim for at least 2 ×, common practice)` : undefined },
      );
      if (b.perUnitVoltage !== null) rows.push({ label: 'Voltage per unit at supply peak', value: fmt.voltage(b.perUnitVoltage) });
      if (!d) rows.push({
        label: 'Bleeders',
        value:
          b.bleeder.inSeries > 1
            ? `${b.bleeder.count} × (${b.bleeder.inSeries} in series) ${fmt.resistance(b.bleeder.resistance / b.bleeder.inSeries)} ½ W, one chain across each unit`
            : `${b.bleeder.count} × ${fmt.resistance(b.bleeder.resistance)} ½ W, one across each unit`,
        note:
          b.bleeder.power !== null
            ? `each unit's bleeder dissipates V²/R = ${fmt.power(b.bleeder.power)}${b.bleeder.withinRating ? ', within ½ W' : ': above ½ W, use a higher-rated resistor'}; time constant ${fmt.sig(b.bleeder.timeConstant, 3)} s`
            : `time constant ${fmt.sig(b.bleeder.timeConstant, 3)} s`,
      });
      if (b.perUnitVoltage !== null) {
        const perResistor = b.perUnitVoltage / b.bleeder.inSeries;
        rows.push({
          label: 'Bleeder voltage check',
          value: `${fmt.voltage(perResistor)} across each resistor, rated ${fmt.voltage(b.bleeder.ratedVoltage)}`,
          note:
            b.bleeder.voltageWithinRating
              ? `within the ${fmt.voltage(b.bleeder.ratedVoltage)} working voltage of a common ½ W film resistor (common practice; check the part's datasheet)`
              : `${fmt.voltage(b.perUnitVoltage)} per unit is above the ${fmt.voltage(b.bleeder.ratedVoltage)} working voltage of a common ½ W film resistor (common practice), so ${b.bleeder.inSeries} resistors go in series across each unit; or use one resistor rated for ${fmt.voltage(b.perUnitVoltage)}`,
        });
      }
      if (b.ratingMargin !== null) {
        rows.push({
          label: 'Capacitor voltage check',
          value: `${fmt.voltage(b.perUnitVoltage!)} across each unit, rated ${fmt.voltage(b.unitVoltage)}`,
          note: b.ratingMargin >= 2 ? 'at least 2 × the supply peak across the string (common practice)' : `only ${fmt.sig(b.ratingMargin, 3)} × the supply peak: add units in series for at least 2 × (common practice)`,
        });
      }
    }
    out.push({ id: 'tank', title: 'Tank capacitor bank', rows, notes: d ? BANK_NOTES.filter((n) => !/bleeder/i.test(n.text)) : BANK_NOTES, caution: 'stored-energy' });
  }

  if (d) {
    const rows: SheetRow[] = [
      { label: 'Drive', value: `${d.topology === 'dual-resonant' ? 'dual-resonant' : 'single-resonant'}, ${d.bridge} bridge, ${fmt.voltage(d.busVoltage)} bus`, note: `${fmt.sig(d.onTime * 1e6, 3)} µs bursts at ${fmt.frequency(d.repetitionRate)}` },
      { label: 'Primary frequency', value: fmt.frequency(d.primaryFrequency), note: 'check it by the ring-down with the bridge disconnected' },
      { label: 'Peak primary current', value: `${fmt.sig(d.peakPrimaryCurrent, 3)} A`, note: 'at the end of the burst; the switches must be rated for it pulsed' },
    ];
    if (d.surgeImpedance !== null) rows.push({ label: 'Surge impedance', value: fmt.resistance(d.surgeImpedance), note: '√(L/C) of the primary at the tap with the tank' });
    if (d.capacitorPeakVoltage !== null) rows.push({ label: 'Tank peak voltage in the burst', value: fmt.voltage(d.capacitorPeakVoltage) });
    if (d.capacitorRmsCurrent !== null) rows.push({ label: 'Tank RMS current', value: `${fmt.sig(d.capacitorRmsCurrent, 3)} A`, note: 'at the repetition rate' });
    const b = d.bank;
    const table: SheetTable | undefined = b
      ? {
          columns: ['Per capacitor', 'In the burst', 'Rating', 'Rating / stress'],
          rows: [
            ['Peak voltage', fmt.voltage(b.unitPeakVoltage), fmt.voltage(b.unitVoltage), `${fmt.sig(b.voltageMargin, 3)} ×`],
            ['RMS current', `${fmt.sig(b.stringRmsCurrent, 3)} A`, b.unitRmsCurrent === null ? 'not given' : `${fmt.sig(b.unitRmsCurrent, 3)} A`, b.currentMargin === null ? '—' : `${fmt.sig(b.currentMargin, 3)} ×`],
            ['Peak current', `${fmt.sig(b.stringPeakCurrent, 3)} A`, 'data sheet (dV/dt × C)', '—'],
          ],
        }
      : undefined;
    if (b) rows.push({ label: 'Bank layout', value: `${b.series} in series × ${b.parallel} strings`, note: 'each string carries an equal share of the tank current; each capacitor an equal share of the string voltage' });
    rows.push({
      label: 'Bus capacitor',
      value: d.bus.capacitance !== null ? fmt.capacitance(d.bus.capacitance) : `about ${fmt.capacitance(d.bus.suggestedCapacitance)} or more`,
      note:
        d.bus.capacitance !== null
          ? `holds ${fmt.energy(d.bus.energy!)} at the bus voltage: potentially lethal; droop ${d.bus.droop === null ? '—' : fmt.voltage(d.bus.droop)} per burst`
          : `for about ${fmt.percent(0.05, 0)} droop per burst (common practice), from C·V·ΔV ≈ energy per burst`,
    });
    rows.push(
      {
        label: 'Feedback current transformer',
        value: `1:${d.feedbackCt.ratio}`,
        note: `about ${fmt.sig(d.feedbackCt.outputPeak, 3)} A peak out at the peak primary current (at most about 5 A; common practice, from memory)`,
      },
      {
        label: 'Trip current transformer',
        value: `1:${d.tripCt.ratio}`,
        note: `about ${fmt.sig(d.tripCt.outputAtTrip, 3)} A out at ${fmt.sig(d.tripCt.trip, 3)} A into the trip's burden resistor (about 0.5 A; common practice, from memory)`,
      },
    );
    rows.push({
      label: 'Primary conductor',
      value: `${fmt.resistance(d.conductor.acResistance)} at ${fmt.frequency(d.primaryFrequency)}`,
      note: d.conductor.heat !== null ? `${fmt.power(d.conductor.heat)} of heat at ${fmt.sig(d.conductor.rmsCurrent!, 3)} A RMS (skin-effect resistance of a solid round conductor)` : 'skin-effect resistance of a solid round conductor',
    });
    out.push({ id: 'drive', title: 'Bridge drive: bank stress, bus, current transformers, conductor', rows, table, notes: SOLID_STATE_NOTES, caution: 'bus' });
  }

  const sup = sheet.supply;
  if (sup && (sup.kind === 'transformer' || !d)) {
    const rows: SheetRow[] = [{ label: 'Supply peak voltage', value: fmt.voltage(sup.peakVoltage) }];
    if (sup.resonantCapacitance !== null) rows.push({ label: 'Resonant capacitance of the transformer', value: fmt.capacitance(sup.resonantCapacitance), note: 'C = I/(2π f V) (P. Lawrence, TCML 2003/June/msg00590)' });
    if (sup.ltrCapacitance !== null) rows.push({ label: 'Larger-than-resonant value', value: fmt.capacitance(sup.ltrCapacitance), note: '1/(4 f Z): charges to full peak in a quarter cycle (bartmcguyer.com, note 1)' });
    if (sup.tankToResonantRatio !== null) rows.push({ label: 'Tank / resonant', value: `${fmt.sig(sup.tankToResonantRatio, 3)} ×`, note: 'near 1 × risks resonant rise with a static or rotary gap (TCML 2003/June/msg00590; B. Hickman, TCML 1999/January/msg00788)' });
    if (sup.filterBypassCapacitors !== null) {
      rows.push({ label: 'Filter bypass capacitors', value: `${sup.filterBypassCapacitors} × 1 nF / 10 kV`, note: 'two up to about 9 kV, four above (hotstreamer.deanostoybox.com/greg/filter.htm)' });
      const perCap = (sup.peakVoltage / 2) / (sup.filterBypassCapacitors / 2);
      rows.push({
        label: 'Bypass capacitor voltage check',
        value: `${fmt.voltage(perCap)} across each, rated 10 kV`,
        note: `each lead peaks at half the ${fmt.voltage(sup.peakVoltage)} output against the centre-tapped case, shared by the capacitors in series on that lead${perCap <= 10000 ? '; within rating' : '; above rating: add capacitors in series'}`,
      });
    }
    out.push({
      id: 'supply',
      title: 'Supply and protection',
      rows,
      notes: sup.kind === 'transformer' ? transformerProtectionNotes(sup.voltage) : SOLID_STATE_NOTES,
      caution: 'supply',
    });
  }

  out.push({ id: 'safety', title: 'Safety checklist', rows: [], list: SAFETY_CHECKLIST, caution: 'general' });
  return out;
}
