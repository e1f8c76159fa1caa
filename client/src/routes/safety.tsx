import { PageTitle, Card } from '../components/ui/feedback';

const cautions = [
  [
    'Unplug and prove dead',
    'Unplug the item and prove it dead with a tester before opening it. Never work on an item while it is plugged in.',
  ],
  [
    'Capacitors hold charge',
    'Switch-mode power supplies keep about 300 V DC on their capacitors after unplugging. Discharge them through a suitable resistor and measure before touching.',
  ],
  [
    'Microwave ovens stay away',
    'Their high-voltage capacitor and magnetron can kill even when unplugged. Groups do not open them.',
  ],
  [
    'Lithium batteries',
    'Never charge, puncture or press a swollen lithium battery. Keep it away from heat and metal tools, and take it out of the hall if it warms up.',
  ],
  [
    'Thermal fuses and cut-outs',
    'Never bypass a thermal fuse or cut-out in kettles, hair dryers, irons or heaters. Replace it with the same rating or not at all.',
  ],
  [
    'Hot surfaces',
    'Heating appliances, soldering irons and hot-air stations stay hot long after they are switched off.',
  ],
  [
    'Test before it goes home',
    'Every mains item is inspected and safety-tested before it goes home where local practice requires it. An item that fails never goes home marked fixed.',
  ],
];

export function SafetyPage() {
  return (
    <div className="max-w-3xl">
      <PageTitle
        title="Safety at the bench"
        lead="The usual cautions of community repair. Local codes and a competent person's judgement always prevail over this page."
      />
      <div className="space-y-3">
        {cautions.map(([title, text]) => (
          <Card key={title}>
            <h2 className="flex items-center gap-2 text-lg">
              <span aria-hidden className="text-copper">
                ⚠
              </span>
              {title}
            </h2>
            <p className="mt-1 text-ink-soft">{text}</p>
          </Card>
        ))}
      </div>
      <p className="mt-6 text-sm text-ink-soft">
        Volunteers help on a best-effort basis. Visitors stay the owners of their items and stay with them while they
        are worked on. Use an RCD-protected supply, and an isolation transformer for any live work.
      </p>
    </div>
  );
}
