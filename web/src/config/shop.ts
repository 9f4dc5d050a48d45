/**
 * The demo workshop shown on the public home page. It is invented: no real business, town or
 * phone number (the number is from the range set aside for fiction).
 */
export const demoShop = {
  name: 'Kestrelmere 4x4 & Tyre',
  town: 'Tallowgate',
  summary:
    'Suspension lifts, wheels and tyres, differential drops and wheel alignment for four-wheel drives.',
  phoneDisplay: '0491 570 006',
  phoneHref: 'tel:+61491570006',
} as const;
