/**
 * Template: staffing a service desk (contact centre or help desk) for a service-level target,
 * with abandonment, a half-hour day profile, the cost of each option and demand growth.
 * Numbers are invented placeholders for a fictional desk; the consultant replaces them.
 */
import { b, block, bullets, cautionsParagraphs, doc, heading, i, linker, para, table } from './doc-builders';
import type { StudyTemplate, TemplateAssumption } from './template-types';

const ASSUMPTIONS: TemplateAssumption[] = [
  {
    key: 'peak_arrival_rate',
    name: 'Contacts offered in the busiest half hour, as an hourly rate',
    value: 250,
    unit: 'per_hour',
    sourceKind: 'dataset',
    sourceDetail: 'Interval report of the telephony platform, eight sample weeks: mean of the busiest half hour (125 contacts) doubled to an hourly rate.',
    notes: 'Replace with the rate fitted from the client dataset. An hourly rate is twice the half-hour count. Use offered contacts (answered plus abandoned), not answered ones.',
  },
  {
    key: 'handling_time',
    name: 'Mean handling time per contact (talk, hold and after-contact work)',
    value: 6.5,
    unit: 'minutes',
    sourceKind: 'dataset',
    sourceDetail: 'Agent activity log, same eight weeks, busiest half hours only.',
    notes: 'Include after-contact work: it keeps the agent unavailable. Check the service-time fit before trusting Erlang C.',
  },
  {
    key: 'answer_threshold',
    name: 'Answer-time threshold of the service target',
    value: 20,
    unit: 'seconds',
    sourceKind: 'client',
    sourceDetail: "To be confirmed with the client's service owner.",
    notes: 'Placeholder uses common practice in contact centres (80 % answered within 20 seconds); it is not a rule and the client may have its own.',
  },
  {
    key: 'service_level_target',
    name: 'Share of contacts to answer within the threshold',
    value: 0.8,
    unit: 'fraction',
    sourceKind: 'client',
    sourceDetail: "To be confirmed with the client's service owner.",
    notes: 'Common practice placeholder (80 %). Keep it as a fraction between 0 and 1: the staffing blocks read the target as a plain number.',
  },
  {
    key: 'agents_at_peak',
    name: 'Agents answering in the peak half hour (option under study)',
    value: 33,
    unit: 'count',
    sourceKind: 'judgement',
    sourceDetail: 'Set by the consultant from the staffing block, or the roster the client proposes.',
    notes: 'Agents actually taking contacts, after breaks, training and absence are taken out. Update it when the staffing answer changes.',
  },
  {
    key: 'mean_patience',
    name: 'Mean time a caller waits before hanging up',
    value: 3,
    unit: 'minutes',
    sourceKind: 'dataset',
    sourceDetail: 'Estimated from the waits of abandoned and answered contacts in the sample weeks.',
    notes: 'Patience is hard to observe: only impatient callers reveal it. Treat as an estimate and test a range.',
  },
  {
    key: 'agent_hour_cost',
    name: 'Loaded cost of one agent hour',
    value: 42,
    unit: 'currency_per_hour',
    sourceKind: 'client',
    sourceDetail: 'Client finance team: pay, on-costs, workstation and supervision share.',
    notes: 'Used by the cost block, which runs in hours; keep the cost per hour.',
  },
  {
    key: 'waiting_hour_cost',
    name: 'Cost placed on one hour of caller waiting',
    value: 30,
    unit: 'currency_per_hour',
    sourceKind: 'judgement',
    sourceDetail: 'Agreed with the client as a working value; there is no market price for waiting.',
    notes: 'A value judgement, not a measurement. Show how the optimum moves when it changes.',
  },
];

const use = linker(ASSUMPTIONS);

/** Hourly arrival rate of each half hour from 08:00 to 18:00 (20 intervals), a fictional weekday. */
const DAY_PROFILE = [96, 140, 196, 232, 250, 238, 214, 188, 170, 152, 166, 192, 206, 198, 178, 152, 128, 104, 82, 60];

const document = doc(
  heading(1, 'Summary and recommendation', 'sd-summary'),
  para(
    i('Guidance: '),
    'state in three or four sentences how many agents the desk needs at its peak and across the day, what callers will experience with that number, and what it costs compared with the other options. Quote the figures from the blocks below so they stay live.',
  ),
  para(
    'We recommend ',
    b('[number]'),
    ' agents answering in the busiest half hour. With that number about ',
    b('[service level]'),
    ' of contacts are answered within the threshold and the mean wait is ',
    b('[Wq]'),
    '.',
  ),

  heading(1, 'Scope and questions', 'sd-scope'),
  para(i('Guidance: '), 'name the desk, the channels in scope (telephone only, or chat and e-mail too), the period the data cover and the questions the client asked.'),
  table(
    ['Question', 'Answered in'],
    [
      ['How many agents are needed at the peak to meet the service target?', 'Staffing at the peak'],
      ['How many callers hang up, and how does that change with staffing?', 'Callers who hang up'],
      ['How should agents be spread across the day?', 'Day profile'],
      ['Which option costs least once waiting is counted?', 'Cost of each option'],
      ['How much demand growth can the recommended roster absorb?', 'Sensitivity'],
    ],
  ),

  heading(1, 'Demand', 'sd-demand'),
  para(
    i('Guidance: '),
    'describe the dataset (source, weeks, cleaning), the arrival rate in the busiest half hour and the mean handling time. Say whether arrivals look random within the half hour (Poisson) and whether handling times look exponential; if the fit is rejected, say so here and in Assumptions and limits.',
  ),
  bullets(
    'Busiest half hour: offered contacts (answered plus abandoned), entered as an hourly rate.',
    'Handling time: talk, hold and after-contact work, from the agent activity log.',
    'Days or weeks left out of the sample (outages, campaigns, holidays) and why.',
  ),

  heading(1, 'Service target', 'sd-target'),
  para(
    i('Guidance: '),
    "record the target the client holds the desk to. The placeholder, 80 % answered within 20 seconds, is common practice in contact centres rather than a rule; replace it with the client's own target and note who set it.",
  ),

  heading(1, 'Staffing at the peak', 'sd-peak'),
  para(
    i('Guidance: '),
    'the first block finds the fewest agents meeting the service target (Erlang C, no abandonment). The second shows the desk at the number under study and how service level and mean wait change with one agent more or less. Erlang C assumes nobody hangs up, so it errs towards more agents.',
  ),
  block('sd-peak-staffing', {
    title: 'Fewest agents meeting the service target in the peak half hour',
    timeUnit: 'hour',
    spec: {
      model: 'staffing',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      criterion: 'serviceLevel',
      target: use('service_level_target'),
      t: use('answer_threshold'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['servers', 'achieved', 'rho', 'probWait', 'Wq'],
  }),
  block('sd-peak-mmc', {
    title: 'The desk at the number of agents under study (Erlang C)',
    timeUnit: 'minute',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      servers: use('agents_at_peak'),
      t: use('answer_threshold'),
      percentile: 0.9,
    },
    scenarios: [],
    chart: { parameter: 'servers', from: 28, to: 38, steps: 11, measures: ['serviceLevel', 'Wq'] },
    shownMeasures: ['offeredLoad', 'rho', 'probWait', 'serviceLevel', 'Wq', 'wqPercentile', 'Lq'],
  }),
  para('The square-root staffing rule (agents ≈ load + β·√load, common practice as a quick check) is shown by the staffing block as β for comparison only; the exact Erlang C answer above is the one to quote.'),

  heading(1, 'Callers who hang up', 'sd-abandonment'),
  para(
    i('Guidance: '),
    'callers who wait too long hang up. The Erlang-A model (M/M/c+M) adds exponential patience: it gives the share who abandon and the service level of those who stay. Compare the options side by side and say which abandonment rate the client can accept.',
  ),
  block('sd-abandon-erlang-a', {
    title: 'Abandonment and service level with caller patience (M/M/c+M)',
    timeUnit: 'minute',
    spec: {
      model: 'M/M/c+M',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      servers: use('agents_at_peak'),
      patienceRate: use('mean_patience'),
      t: use('answer_threshold'),
    },
    scenarios: [
      { label: 'Two agents fewer', overrides: { servers: 31 } },
      { label: 'Two agents more', overrides: { servers: 35 } },
    ],
    chart: null,
    shownMeasures: ['probAbandon', 'serviceLevel', 'probWait', 'Wq', 'effectiveArrivalRate'],
  }),

  heading(1, 'Day profile', 'sd-day'),
  para(
    i('Guidance: '),
    'enter the demand profile of a typical day, one value per half hour from opening to close, as hourly rates (twice each half-hour count). The block staffs each half hour as if demand were steady within it; shifts, breaks and absence come on top of these numbers.',
  ),
  block('sd-day-profile', {
    title: 'Agents needed in each half hour, 08:00 to 18:00',
    timeUnit: 'hour',
    spec: {
      model: 'interval-staffing',
      arrivalRates: DAY_PROFILE,
      intervalLength: 0.5,
      serviceRate: use('handling_time'),
      criterion: 'serviceLevel',
      target: use('service_level_target'),
      t: use('answer_threshold'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['peakServers', 'totalServerIntervals'],
  }),
  para('Agent-hours on the phones for the day are the server-intervals above times half an hour. Add the client’s shrinkage allowance before comparing with the roster.'),

  heading(1, 'Cost of each option', 'sd-cost'),
  para(
    i('Guidance: '),
    'weigh the cost of agents against a cost placed on callers’ waiting. The waiting cost is a judgement agreed with the client, so show the options side by side as well as the cost-optimal number, and do not present the optimum as the answer on its own.',
  ),
  block('sd-cost-optimum', {
    title: 'Cost-optimal number of agents at the peak (agent cost plus waiting cost)',
    timeUnit: 'hour',
    spec: {
      model: 'cost-optimum',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      serverCost: use('agent_hour_cost'),
      waitingCost: use('waiting_hour_cost'),
      costBasis: 'Lq',
    },
    scenarios: [{ label: 'Waiting valued at twice the working value', overrides: { waitingCost: 60 } }],
    chart: null,
    shownMeasures: ['servers', 'totalCost', 'rho', 'Wq'],
  }),
  block('sd-options', {
    title: 'Rostering options side by side at the peak',
    timeUnit: 'minute',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      servers: use('agents_at_peak'),
      t: use('answer_threshold'),
    },
    scenarios: [
      { label: '31 agents', overrides: { servers: 31 } },
      { label: '32 agents', overrides: { servers: 32 } },
      { label: '34 agents', overrides: { servers: 34 } },
      { label: '35 agents', overrides: { servers: 35 } },
    ],
    chart: null,
    shownMeasures: ['rho', 'serviceLevel', 'Wq', 'probWait'],
  }),

  heading(1, 'Sensitivity', 'sd-sensitivity'),
  para(
    i('Guidance: '),
    'show what happens to service at the number under study if demand grows. The chart runs from today’s peak to about 16 % more; if the peak assumption changes, adjust the chart range to match. Near full utilisation small changes in demand move waiting a lot (above about 85–90 % is common practice for “fragile”).',
  ),
  block('sd-growth', {
    title: 'Service level and probability of waiting as peak demand grows',
    timeUnit: 'hour',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('peak_arrival_rate'),
      serviceRate: use('handling_time'),
      servers: use('agents_at_peak'),
      t: use('answer_threshold'),
    },
    scenarios: [],
    chart: { parameter: 'arrivalRate', from: 250, to: 290, steps: 9, measures: ['serviceLevel', 'probWait'] },
    shownMeasures: ['rho', 'serviceLevel', 'probWait'],
  }),

  heading(1, 'Assumptions and limits', 'sd-limits'),
  para(i('Guidance: '), 'list what the models take for granted and how far the figures can be relied on. Keep the items that apply and add the client’s specifics.'),
  bullets(
    'Arrivals within the busiest half hour are random and steady (Poisson); demand that rises or falls within the half hour makes waits worse than shown.',
    'Handling times are exponential for Erlang C and Erlang-A; the dataset fit says how far that holds.',
    'Every agent handles every contact type (one skill group); separate queues need separate blocks.',
    'Erlang C ignores callers who hang up and those who call back; Erlang-A assumes exponential patience.',
    'The day profile staffs each half hour on its own; it understates need when demand climbs quickly.',
    'Agents counted here are on the phones: shrinkage (breaks, training, absence) is added on top.',
  ),

  heading(1, 'Cautions', 'sd-cautions'),
  ...cautionsParagraphs(),
);

export const serviceDeskStaffing: StudyTemplate = {
  key: 'service-desk-staffing',
  title: 'Service-desk staffing',
  description:
    'Agents needed at a contact centre or help desk for a service-level target: peak staffing (Erlang C), callers who hang up (Erlang-A), a half-hour day profile, the cost of each option and demand growth.',
  safetyCritical: false,
  assumptions: ASSUMPTIONS,
  document,
};
