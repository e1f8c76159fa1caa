import type { Equipment, Skill } from './constants';

/**
 * The seeded item taxonomy. WEEE categories: Directive 2012/19/EU Annex III (6 open-scope categories, from
 * 15 Aug 2018); `null` for non-electrical items. Weights: Statistics Netherlands open e-waste dataset, table of
 * UNU-KEY average weights (2020), unless the source says otherwise.
 */
export interface CategorySeed {
  slug: string;
  name: string;
  weeeCategory: 1 | 2 | 3 | 4 | 5 | 6 | null;
  unuKey: string | null;
  avgWeightKg: number;
  weightSource: string;
  skill: Skill;
  equipment: Equipment[];
  repairMinutes: number;
  mains: boolean;
  /** Common practice: groups refuse these by default; the reason and a suggestion are shown to the visitor. */
  refusal?: { reason: string; suggestion: string };
}

const UNU = (key: string) => `Statistics Netherlands e-waste dataset, UNU-KEY ${key} average weight (2020)`;
const SAFETY: Equipment[] = ['multimeter', 'appliance-safety-tester'];

export const CATEGORY_SEEDS: CategorySeed[] = [
  { slug: 'kettle', name: 'Kettle', weeeCategory: 5, unuKey: '0203', avgWeightKg: 1.89, weightSource: UNU('0203'), skill: 'electrical', equipment: SAFETY, repairMinutes: 30, mains: true },
  { slug: 'coffee-maker', name: 'Coffee maker', weeeCategory: 5, unuKey: '0203', avgWeightKg: 1.89, weightSource: UNU('0203'), skill: 'electrical', equipment: SAFETY, repairMinutes: 40, mains: true },
  { slug: 'toaster', name: 'Toaster or grill', weeeCategory: 5, unuKey: '0202', avgWeightKg: 3.27, weightSource: UNU('0202'), skill: 'electrical', equipment: SAFETY, repairMinutes: 30, mains: true },
  { slug: 'food-mixer', name: 'Food mixer or blender', weeeCategory: 5, unuKey: '0202', avgWeightKg: 3.27, weightSource: UNU('0202'), skill: 'electrical', equipment: SAFETY, repairMinutes: 40, mains: true },
  { slug: 'iron', name: 'Iron', weeeCategory: 5, unuKey: '0201', avgWeightKg: 0.99, weightSource: UNU('0201'), skill: 'electrical', equipment: SAFETY, repairMinutes: 30, mains: true },
  { slug: 'vacuum-cleaner', name: 'Vacuum cleaner', weeeCategory: 5, unuKey: '0204', avgWeightKg: 5.88, weightSource: UNU('0204'), skill: 'electrical', equipment: SAFETY, repairMinutes: 40, mains: true },
  { slug: 'hair-dryer', name: 'Hair dryer, shaver or other personal care', weeeCategory: 5, unuKey: '0205', avgWeightKg: 0.55, weightSource: UNU('0205'), skill: 'electrical', equipment: SAFETY, repairMinutes: 30, mains: true },
  { slug: 'lamp', name: 'Table or floor lamp', weeeCategory: 5, unuKey: '0506', avgWeightKg: 0.45, weightSource: UNU('0506'), skill: 'electrical', equipment: SAFETY, repairMinutes: 30, mains: true },
  { slug: 'led-lamp', name: 'LED bulb or lamp', weeeCategory: 3, unuKey: '0505', avgWeightKg: 0.08, weightSource: UNU('0505'), skill: 'electrical', equipment: ['multimeter'], repairMinutes: 20, mains: true },
  { slug: 'power-tool', name: 'Power tool (drill, saw, sander)', weeeCategory: 5, unuKey: '0601', avgWeightKg: 2.49, weightSource: UNU('0601'), skill: 'electrical', equipment: SAFETY, repairMinutes: 40, mains: true },
  { slug: 'washing-machine', name: 'Washing machine', weeeCategory: 4, unuKey: '0104', avgWeightKg: 72.54, weightSource: UNU('0104'), skill: 'electrical', equipment: SAFETY, repairMinutes: 60, mains: true },
  { slug: 'clock', name: 'Clock or small household device', weeeCategory: 5, unuKey: '0201', avgWeightKg: 0.99, weightSource: UNU('0201'), skill: 'electronics', equipment: ['soldering-station', 'multimeter'], repairMinutes: 30, mains: false },
  { slug: 'radio-hifi', name: 'Radio, hi-fi or electronic instrument', weeeCategory: 5, unuKey: '0403', avgWeightKg: 3.73, weightSource: UNU('0403'), skill: 'electronics', equipment: ['soldering-station', 'multimeter', 'appliance-safety-tester'], repairMinutes: 45, mains: true },
  { slug: 'speaker', name: 'Speaker or headphones', weeeCategory: 5, unuKey: '0405', avgWeightKg: 2.14, weightSource: UNU('0405'), skill: 'electronics', equipment: ['soldering-station', 'multimeter'], repairMinutes: 40, mains: false },
  { slug: 'video-player', name: 'DVD player, projector or set-top box', weeeCategory: 5, unuKey: '0404', avgWeightKg: 3.51, weightSource: UNU('0404'), skill: 'electronics', equipment: ['soldering-station', 'multimeter', 'appliance-safety-tester'], repairMinutes: 45, mains: true },
  { slug: 'television', name: 'Flat-screen television', weeeCategory: 2, unuKey: '0408', avgWeightKg: 10.2, weightSource: UNU('0408'), skill: 'electronics', equipment: ['soldering-station', 'multimeter', 'appliance-safety-tester'], repairMinutes: 60, mains: true },
  { slug: 'monitor', name: 'Computer monitor', weeeCategory: 2, unuKey: '0309', avgWeightKg: 5.5, weightSource: UNU('0309'), skill: 'electronics', equipment: ['soldering-station', 'multimeter', 'appliance-safety-tester'], repairMinutes: 60, mains: true },
  { slug: 'game-console', name: 'Game console', weeeCategory: 6, unuKey: '0702', avgWeightKg: 0.48, weightSource: UNU('0702'), skill: 'electronics', equipment: ['soldering-station', 'hot-air-station', 'multimeter'], repairMinutes: 45, mains: true },
  { slug: 'laptop', name: 'Laptop', weeeCategory: 2, unuKey: '0303', avgWeightKg: 0.85, weightSource: UNU('0303'), skill: 'computers', equipment: ['multimeter'], repairMinutes: 45, mains: false },
  { slug: 'desktop-pc', name: 'Desktop computer', weeeCategory: 6, unuKey: '0302', avgWeightKg: 8.77, weightSource: UNU('0302'), skill: 'computers', equipment: ['multimeter', 'appliance-safety-tester'], repairMinutes: 60, mains: true },
  { slug: 'printer', name: 'Printer or scanner', weeeCategory: 6, unuKey: '0304', avgWeightKg: 10.32, weightSource: UNU('0304'), skill: 'computers', equipment: ['multimeter', 'appliance-safety-tester'], repairMinutes: 45, mains: true },
  { slug: 'small-it', name: 'Router, keyboard, mouse or other small IT', weeeCategory: 6, unuKey: '0301', avgWeightKg: 0.4, weightSource: UNU('0301'), skill: 'computers', equipment: ['soldering-station', 'multimeter'], repairMinutes: 30, mains: false },
  { slug: 'phone', name: 'Mobile phone', weeeCategory: 6, unuKey: '0306', avgWeightKg: 0.09, weightSource: UNU('0306'), skill: 'phones', equipment: ['hot-air-station', 'multimeter'], repairMinutes: 40, mains: false },
  { slug: 'tablet', name: 'Tablet or e-reader', weeeCategory: 2, unuKey: '0303', avgWeightKg: 0.85, weightSource: UNU('0303'), skill: 'phones', equipment: ['hot-air-station', 'multimeter'], repairMinutes: 45, mains: false },
  { slug: 'electric-toy', name: 'Electric or battery toy', weeeCategory: 5, unuKey: '0701', avgWeightKg: 0.45, weightSource: UNU('0701'), skill: 'toys', equipment: ['soldering-station', 'multimeter'], repairMinutes: 30, mains: false },
  { slug: 'toy', name: 'Toy without electrics', weeeCategory: null, unuKey: null, avgWeightKg: 0.45, weightSource: 'Assumed equal to UNU-KEY 0701 toys (from memory that non-electric toys weigh about the same); weigh at intake', skill: 'toys', equipment: ['clamps'], repairMinutes: 30, mains: false },
  { slug: 'clothing', name: 'Clothing', weeeCategory: null, unuKey: null, avgWeightKg: 0.45, weightSource: 'Between a T-shirt (≈ 0.2 kg) and jeans (≈ 0.7 kg), from memory; weigh textiles at intake', skill: 'textiles', equipment: ['sewing-machine'], repairMinutes: 30, mains: false },
  { slug: 'bag-textile', name: 'Bag, shoes or household textile', weeeCategory: null, unuKey: null, avgWeightKg: 0.7, weightSource: 'From memory; weigh at intake', skill: 'textiles', equipment: ['sewing-machine'], repairMinutes: 30, mains: false },
  { slug: 'bicycle', name: 'Bicycle', weeeCategory: null, unuKey: null, avgWeightKg: 15, weightSource: 'Weidema 2013, bicycle life-cycle example (12.5 kg metal, 2 kg plastic, 0.5 kg rubber)', skill: 'bikes', equipment: ['bike-stand'], repairMinutes: 45, mains: false },
  { slug: 'wooden-chair', name: 'Chair', weeeCategory: null, unuKey: null, avgWeightKg: 9.6, weightSource: 'ADEME 2018 furniture LCA documentation (wooden chair)', skill: 'woodwork', equipment: ['clamps'], repairMinutes: 45, mains: false },
  { slug: 'table', name: 'Table or other wooden furniture', weeeCategory: null, unuKey: null, avgWeightKg: 50, weightSource: 'ADEME 2018 furniture LCA documentation (wooden 4-seat table)', skill: 'woodwork', equipment: ['clamps'], repairMinutes: 60, mains: false },
  { slug: 'jewellery', name: 'Jewellery or watch strap', weeeCategory: null, unuKey: null, avgWeightKg: 0.05, weightSource: 'From memory; weigh at intake', skill: 'jewellery', equipment: [], repairMinutes: 30, mains: false },
  { slug: 'mechanical', name: 'Mechanical item (umbrella, pram, tool without power)', weeeCategory: null, unuKey: null, avgWeightKg: 1.5, weightSource: 'From memory; weigh at intake', skill: 'mechanical', equipment: ['clamps'], repairMinutes: 30, mains: false },
  {
    slug: 'microwave', name: 'Microwave oven', weeeCategory: 5, unuKey: '0114', avgWeightKg: 22.9, weightSource: UNU('0114'), skill: 'electrical', equipment: SAFETY, repairMinutes: 45, mains: true,
    refusal: { reason: 'Microwave ovens hold a high-voltage capacitor that can kill even when unplugged.', suggestion: 'Ask an appliance repairer with microwave training, or take it to your council’s electrical recycling point.' },
  },
  {
    slug: 'fridge', name: 'Fridge, freezer or dehumidifier', weeeCategory: 1, unuKey: '0108', avgWeightKg: 40.79, weightSource: UNU('0108'), skill: 'electrical', equipment: SAFETY, repairMinutes: 60, mains: true,
    refusal: { reason: 'Refrigerant circuits may only be opened by certified refrigeration engineers.', suggestion: 'A refrigeration engineer can check the circuit; door seals and shelves can come to us as spare parts questions.' },
  },
  {
    slug: 'gas-appliance', name: 'Gas appliance (heater, hob, barbecue)', weeeCategory: null, unuKey: null, avgWeightKg: 10, weightSource: 'From memory', skill: 'mechanical', equipment: [], repairMinutes: 45, mains: false,
    refusal: { reason: 'Gas appliances must be serviced by a registered gas engineer.', suggestion: 'Contact a registered gas engineer near you.' },
  },
];
