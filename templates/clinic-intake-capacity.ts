/**
 * Template: intake desks and screening staff at a walk-in clinic or donation session, with a
 * finite waiting area. Safety-critical: the cautions open and close the study. Numbers are
 * invented placeholders for a fictional session; the consultant replaces them.
 */
import { b, block, bullets, cautionsParagraphs, doc, heading, i, linker, para, quote } from './doc-builders';
import type { StudyTemplate, TemplateAssumption } from './template-types';

const ASSUMPTIONS: TemplateAssumption[] = [
  {
    key: 'session_arrival_rate',
    name: 'Arrivals in the busiest hour of a daytime session',
    value: 36,
    unit: 'per_hour',
    sourceKind: 'dataset',
    sourceDetail: 'Door-count and registration timestamps, twelve sample sessions: mean of the busiest hour.',
    notes: 'Count everyone who arrives, including those who leave before intake. Replace with the rate fitted from the client dataset.',
  },
  {
    key: 'evening_arrival_rate',
    name: 'Arrivals in the busiest hour of a proposed evening session',
    value: 44,
    unit: 'per_hour',
    sourceKind: 'client',
    sourceDetail: "Operations lead's forecast for the proposed evening sessions.",
    notes: 'A forecast, not an observation. Revisit once evening sessions have run.',
  },
  {
    key: 'intake_time',
    name: 'Mean time at the intake desk (identity check and registration)',
    value: 4,
    unit: 'minutes',
    sourceKind: 'dataset',
    sourceDetail: 'Registration system: time from opening to closing a record, twelve sample sessions.',
    notes: 'First visits take longer than returning ones; if the mix changes, refit.',
  },
  {
    key: 'intake_desks',
    name: 'Intake desks staffed',
    value: 3,
    unit: 'count',
    sourceKind: 'client',
    sourceDetail: 'Session rota supplied by the client.',
    notes: 'Desks actually open in the busiest hour.',
  },
  {
    key: 'intake_wait_threshold',
    name: 'Wait at intake the client regards as acceptable',
    value: 5,
    unit: 'minutes',
    sourceKind: 'client',
    sourceDetail: "To be confirmed with the client's session lead.",
    notes: 'Placeholder; the client sets it.',
  },
  {
    key: 'screening_time',
    name: 'Mean health-screening time per person',
    value: 11,
    unit: 'minutes',
    sourceKind: 'dataset',
    sourceDetail: 'Screening start and end times recorded by staff, twelve sample sessions.',
    notes: 'Includes the time to call the next person and reset the bay.',
  },
  {
    key: 'screening_scv',
    name: 'Squared coefficient of variation of screening times',
    value: 0.45,
    unit: 'number',
    sourceKind: 'dataset',
    sourceDetail: 'Variance over mean squared of the recorded screening times.',
    notes: 'Below 1: screening times vary less than the exponential assumption of M/M/c implies.',
  },
  {
    key: 'arrival_scv',
    name: 'Squared coefficient of variation of times between arrivals',
    value: 1,
    unit: 'number',
    sourceKind: 'judgement',
    sourceDetail: 'Walk-in arrivals treated as random (value 1) pending analysis of the arrival log.',
    notes: 'Booked appointments usually lower it; group arrivals (a bus, a shift change) raise it. Measure before relying on it.',
  },
  {
    key: 'screening_staff',
    name: 'Screening staff on duty in the busiest hour',
    value: 8,
    unit: 'count',
    sourceKind: 'client',
    sourceDetail: 'Session rota supplied by the client.',
    notes: 'Registered staff actually screening, after breaks. Minimum staffing set by regulation or agreement overrides any figure here.',
  },
  {
    key: 'screening_places',
    name: 'Places in the screening area, bays included',
    value: 20,
    unit: 'count',
    sourceKind: 'client',
    sourceDetail: 'Site plan: screening bays plus waiting seats allowed by the fire-safety occupancy limit.',
    notes: 'When every place is taken, new arrivals are turned away or asked to return; the finite-room block counts them.',
  },
];

const use = linker(ASSUMPTIONS);

const document = doc(
  heading(1, 'Cautions', 'ci-cautions-top'),
  para(b('This study concerns a health service. '), 'Its figures can affect the safety and wellbeing of the people attending and of the staff.'),
  ...cautionsParagraphs(),

  heading(1, 'Summary and recommendation', 'ci-summary'),
  para(
    i('Guidance: '),
    'state how many intake desks and screening staff the busiest hour needs, how long people will wait, and how many may be turned away because the screening area is full. Quote the blocks below so the figures stay live, and repeat that the decision rests with the client’s responsible, licensed professionals.',
  ),
  para('For the busiest hour we estimate that ', b('[number]'), ' screening staff keep the mean wait near ', b('[Wq]'), ' and turn away about ', b('[blocking]'), ' of arrivals.'),

  heading(1, 'Scope and questions', 'ci-scope'),
  para(i('Guidance: '), 'name the sites and session types in scope, the period the data cover, and the questions asked. Say what is out of scope (clinical procedures, recovery areas, follow-up).'),
  bullets(
    'How long do people wait at intake, and would a further desk help?',
    'How many people are turned away when the screening area is full?',
    'How many screening staff does the busiest hour need for an acceptable mean wait?',
    'What changes if evening sessions bring more people?',
  ),

  heading(1, 'Clinical and regulatory context', 'ci-context'),
  para(
    i('Guidance: '),
    'record every staffing ratio, competence requirement or occupancy limit that applies (law, regulator, professional body, collective agreement), with its source. These rules bind; the model results below never replace them. Where a model figure is lower than a rule, the rule stands.',
  ),

  heading(1, 'Arrivals and service times', 'ci-demand'),
  para(
    i('Guidance: '),
    'describe the dataset, the busiest hour, the intake and screening times and how variable they are. Report the exponential fit test for each; where it is rejected, rely on the Allen–Cunneen block rather than the M/M/c figures.',
  ),

  heading(1, 'Intake desk', 'ci-intake'),
  para(i('Guidance: '), 'the intake desk modelled as M/M/c (Erlang C). The chart shows mean wait and the share seen within the acceptable wait for three to six desks.'),
  block('ci-intake-mmc', {
    title: 'Intake desk in the busiest hour (M/M/c)',
    timeUnit: 'minute',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('session_arrival_rate'),
      serviceRate: use('intake_time'),
      servers: use('intake_desks'),
      t: use('intake_wait_threshold'),
      percentile: 0.9,
    },
    scenarios: [],
    chart: { parameter: 'servers', from: 3, to: 6, steps: 4, measures: ['Wq', 'serviceLevel'] },
    shownMeasures: ['rho', 'probWait', 'Wq', 'serviceLevel', 'wqPercentile', 'Lq'],
  }),

  heading(1, 'Screening area and people turned away', 'ci-room'),
  para(
    i('Guidance: '),
    'the screening area holds a limited number of people, bays included. M/M/c/K counts those who arrive when it is full: the blocking probability is the share turned away or asked to come back. Compare the daytime and evening cases, and say what happens to the people turned away.',
  ),
  block('ci-room-mmck', {
    title: 'Screening with a finite area: waits and people turned away (M/M/c/K)',
    timeUnit: 'minute',
    spec: {
      model: 'M/M/c/K',
      arrivalRate: use('session_arrival_rate'),
      serviceRate: use('screening_time'),
      servers: use('screening_staff'),
      capacity: use('screening_places'),
    },
    scenarios: [{ label: 'Evening session', overrides: { arrivalRate: use('evening_arrival_rate') } }],
    chart: { parameter: 'capacity', from: 8, to: 32, steps: 13, measures: ['probBlock'] },
    shownMeasures: ['rho', 'probBlock', 'effectiveArrivalRate', 'Wq', 'Lq', 'L'],
  }),

  heading(1, 'Screening with measured variability', 'ci-variability'),
  para(
    i('Guidance: '),
    'screening times rarely follow the exponential distribution. The Allen–Cunneen approximation (G/G/c) uses the measured variability of screening times and of arrivals. It is an approximation: say so when quoting it, and check it against observed waits.',
  ),
  block('ci-screening-ggc', {
    title: 'Screening wait with measured variability (G/G/c, Allen–Cunneen)',
    timeUnit: 'minute',
    spec: {
      model: 'G/G/c',
      arrivalRate: use('session_arrival_rate'),
      serviceRate: use('screening_time'),
      servers: use('screening_staff'),
      arrivalScv: use('arrival_scv'),
      serviceScv: use('screening_scv'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['rho', 'erlangC', 'Wq', 'Lq', 'W'],
  }),

  heading(1, 'Screening staff for a mean-wait target', 'ci-staffing'),
  para(
    i('Guidance: '),
    'the fewest screening staff for a mean wait of at most 10 minutes (a placeholder typed in the block, in minutes; agree the target with the client and its clinical lead). The answer is a floor from the model, not a rota: regulated minimum staffing, competence mix, breaks and cover come first.',
  ),
  block('ci-staffing-wait', {
    title: 'Fewest screening staff for a mean wait of at most 10 minutes',
    timeUnit: 'minute',
    spec: {
      model: 'staffing',
      arrivalRate: use('session_arrival_rate'),
      serviceRate: use('screening_time'),
      criterion: 'meanWait',
      target: 10,
    },
    scenarios: [{ label: 'Evening session', overrides: { arrivalRate: use('evening_arrival_rate') } }],
    chart: null,
    shownMeasures: ['servers', 'achieved', 'rho', 'probWait'],
  }),

  heading(1, 'Assumptions and limits', 'ci-limits'),
  bullets(
    'Arrivals are steady within the busiest hour; surges (opening time, a group arriving together) make waits longer than shown.',
    'M/M/c and M/M/c/K assume exponential service times; the Allen–Cunneen block is an approximation that uses the measured variability instead.',
    'People who leave the queue on their own are not modelled; the finite-room block counts only those turned away at the door.',
    'Intake and screening are modelled separately; intake smooths the flow into screening a little, which these blocks do not credit.',
    'Every screening staff member is assumed able to screen every person; specialist checks need their own block.',
    'Figures describe the busiest hour; quieter hours need fewer staff only where the rules allow it.',
  ),

  heading(1, 'Cautions', 'ci-cautions-end'),
  ...cautionsParagraphs(),
  quote(
    'Where any figure in this study conflicts with a staffing rule, an occupancy limit or the professional judgement of the clinicians responsible for the service, the rule and that judgement prevail.',
  ),
);

export const clinicIntakeCapacity: StudyTemplate = {
  key: 'clinic-intake-capacity',
  title: 'Clinic intake capacity',
  description:
    'Intake desks, screening staff and a finite waiting area at a walk-in clinic or donation session: waits (Erlang C, Allen–Cunneen), people turned away (M/M/c/K) and staff for a mean-wait target. Safety-critical: carries the cautions at the start and the end.',
  safetyCritical: true,
  assumptions: ASSUMPTIONS,
  document,
};
