/**
 * Template: capacity headroom of a web service's application tier (worker slots behind a load
 * balancer), in requests per second. Numbers are invented placeholders for a fictional service;
 * the consultant replaces them.
 */
import { b, block, bullets, cautionsParagraphs, doc, heading, i, linker, para } from './doc-builders';
import type { StudyTemplate, TemplateAssumption } from './template-types';

const ASSUMPTIONS: TemplateAssumption[] = [
  {
    key: 'peak_request_rate',
    name: 'Requests per second in the busiest minute',
    value: 420,
    unit: 'per_second',
    sourceKind: 'dataset',
    sourceDetail: 'Load-balancer access log, four sample weeks: mean rate of the busiest minute of each day, then the median over days.',
    notes: 'Use requests that reach the application tier (after caches). Replace with the rate fitted from the client dataset.',
  },
  {
    key: 'request_service_time',
    name: 'Mean application time per request in one worker slot',
    value: 0.06,
    unit: 'seconds',
    sourceKind: 'dataset',
    sourceDetail: 'Request tracing, same weeks: time a worker slot is busy per request, network and queueing excluded.',
    notes: 'The mean, not the median: the tail matters.',
  },
  {
    key: 'service_scv',
    name: 'Squared coefficient of variation of request service times',
    value: 2.5,
    unit: 'number',
    sourceKind: 'dataset',
    sourceDetail: 'Variance over mean squared of traced service times.',
    notes: 'Above 1: a few slow requests (reports, exports) dominate. Exponential models understate waits here.',
  },
  {
    key: 'arrival_scv',
    name: 'Squared coefficient of variation of times between requests',
    value: 1.3,
    unit: 'number',
    sourceKind: 'dataset',
    sourceDetail: 'Inter-arrival times at the load balancer in the busiest minutes.',
    notes: 'Above 1: requests arrive in bursts (page loads fetch several resources, clients retry).',
  },
  {
    key: 'worker_slots',
    name: 'Worker slots in the pool today',
    value: 32,
    unit: 'count',
    sourceKind: 'client',
    sourceDetail: 'Deployment configuration: 8 instances with 4 worker slots each.',
    notes: 'A slot handles one request at a time. Count only instances in rotation at the peak.',
  },
  {
    key: 'planned_worker_slots',
    name: 'Worker slots in the pool after the proposed expansion',
    value: 40,
    unit: 'count',
    sourceKind: 'judgement',
    sourceDetail: 'Option under study: 10 instances with 4 worker slots each.',
    notes: 'Set from the utilisation-cap block or the option the client is considering.',
  },
  {
    key: 'utilisation_cap',
    name: 'Utilisation cap for the worker pool',
    value: 0.7,
    unit: 'fraction',
    sourceKind: 'judgement',
    sourceDetail: 'Common practice for headroom on a pool serving interactive traffic; agree with the client.',
    notes: 'Common practice, not a rule: it leaves room for an instance failing and for bursts. Keep it as a fraction between 0 and 1.',
  },
  {
    key: 'wait_percentile',
    name: 'Percentile of queueing delay reported',
    value: 99,
    unit: 'percent',
    sourceKind: 'client',
    sourceDetail: "The client's latency objective is stated at the 99th percentile.",
    notes: 'Percentiles far in the tail rest on the exponential assumption; compare with measured latency percentiles.',
  },
  {
    key: 'queue_delay_budget',
    name: 'Queueing delay budget per request',
    value: 0.05,
    unit: 'seconds',
    sourceKind: 'client',
    sourceDetail: 'Share of the end-to-end latency objective left for waiting for a worker slot.',
    notes: 'The peak block reports the share of requests that wait no longer than this.',
  },
  {
    key: 'connection_limit',
    name: 'Requests the pool holds at once (in service plus backlog)',
    value: 48,
    unit: 'count',
    sourceKind: 'client',
    sourceDetail: 'Deployment configuration: 32 worker slots plus a backlog of 16; further requests are refused.',
    notes: 'Refused requests reach users as errors or retries; the finite-room block counts them.',
  },
  {
    key: 'writer_request_rate',
    name: 'Writes per second reaching the single-threaded audit writer',
    value: 140,
    unit: 'per_second',
    sourceKind: 'dataset',
    sourceDetail: 'Writer metrics in the busiest minutes of the sample weeks.',
    notes: 'One write per request that changes data; check the ratio if the traffic mix shifts.',
  },
  {
    key: 'writer_service_time',
    name: 'Mean time per write in the audit writer',
    value: 0.004,
    unit: 'seconds',
    sourceKind: 'dataset',
    sourceDetail: 'Writer metrics: busy time per write.',
    notes: 'Four milliseconds, entered in seconds.',
  },
  {
    key: 'writer_scv',
    name: 'Squared coefficient of variation of write times',
    value: 1.8,
    unit: 'number',
    sourceKind: 'dataset',
    sourceDetail: 'Variance over mean squared of write times.',
    notes: 'Above 1: occasional slow writes (index maintenance, disk flushes).',
  },
];

const use = linker(ASSUMPTIONS);

const document = doc(
  heading(1, 'Summary and recommendation', 'ws-summary'),
  para(
    i('Guidance: '),
    'state how much headroom the pool has at today’s peak, how many worker slots keep utilisation under the cap, what queueing delay users see at the reported percentile, and how much growth the proposed pool absorbs. Quote the blocks so the figures stay live.',
  ),
  para('At today’s peak the pool runs at ', b('[ρ]'), ' utilisation. We recommend ', b('[number]'), ' worker slots, which keeps utilisation under the cap and the reported percentile of queueing delay near ', b('[delay]'), '.'),

  heading(1, 'Scope and questions', 'ws-scope'),
  para(i('Guidance: '), 'name the service, the tier modelled, the traffic in scope and the period of the data. Note what is out of scope (databases, caches, third-party calls) unless modelled separately.'),
  bullets(
    'How close to saturation is the application tier at today’s peak?',
    'How many worker slots keep utilisation under the cap?',
    'What queueing delay do users see, on average and at the reported percentile?',
    'How much traffic growth does the proposed pool absorb?',
    'How often does the bounded backlog refuse requests?',
  ),

  heading(1, 'Traffic and service times', 'ws-demand'),
  para(
    i('Guidance: '),
    'describe the logs and traces used, the busiest minute, the mean service time per worker slot and how variable arrivals and service times are. Heavy-tailed service times (a variability above 1) mean the exponential blocks understate waits; lean on the G/G/c block.',
  ),

  heading(1, 'The pool at today’s peak', 'ws-peak'),
  para(i('Guidance: '), 'the pool modelled as M/M/c with one server per worker slot. Times are in seconds.'),
  block('ws-peak-mmc', {
    title: 'Worker pool at the peak (M/M/c, one server per worker slot)',
    timeUnit: 'second',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('peak_request_rate'),
      serviceRate: use('request_service_time'),
      servers: use('worker_slots'),
      t: use('queue_delay_budget'),
      percentile: use('wait_percentile'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['offeredLoad', 'rho', 'probWait', 'Wq', 'wqPercentile', 'serviceLevel', 'W'],
  }),

  heading(1, 'Worker slots under a utilisation cap', 'ws-cap'),
  para(
    i('Guidance: '),
    'the fewest worker slots that keep utilisation at or below the cap. A cap near 0.7 is common practice for interactive services; it is a choice to agree with the client, not a law of nature.',
  ),
  block('ws-cap-staffing', {
    title: 'Fewest worker slots with utilisation at or below the cap',
    timeUnit: 'second',
    spec: {
      model: 'staffing',
      arrivalRate: use('peak_request_rate'),
      serviceRate: use('request_service_time'),
      criterion: 'utilization',
      target: use('utilisation_cap'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['servers', 'achieved', 'rho'],
  }),

  heading(1, 'Variable service times', 'ws-variability'),
  para(
    i('Guidance: '),
    'real service times vary more than the exponential. The Allen–Cunneen approximation (G/G/c) scales the Erlang C wait by the measured variability of arrivals and service. For a single-threaded component, M/G/1 (Pollaczek–Khinchine) is exact for random arrivals.',
  ),
  block('ws-pool-ggc', {
    title: 'Worker pool with measured variability (G/G/c, Allen–Cunneen)',
    timeUnit: 'second',
    spec: {
      model: 'G/G/c',
      arrivalRate: use('peak_request_rate'),
      serviceRate: use('request_service_time'),
      servers: use('worker_slots'),
      arrivalScv: use('arrival_scv'),
      serviceScv: use('service_scv'),
    },
    scenarios: [{ label: 'Proposed pool', overrides: { servers: use('planned_worker_slots') } }],
    chart: null,
    shownMeasures: ['rho', 'erlangC', 'Wq', 'W', 'Lq'],
  }),
  block('ws-writer-mg1', {
    title: 'Single-threaded audit writer (M/G/1, Pollaczek–Khinchine)',
    timeUnit: 'second',
    spec: {
      model: 'M/G/1',
      arrivalRate: use('writer_request_rate'),
      serviceRate: use('writer_service_time'),
      serviceScv: use('writer_scv'),
    },
    scenarios: [],
    chart: null,
    shownMeasures: ['rho', 'Wq', 'W', 'Lq'],
  }),

  heading(1, 'Growth', 'ws-growth'),
  para(
    i('Guidance: '),
    'how queueing delay grows with traffic for the proposed pool. The chart runs from today’s peak (420 requests per second) to about 1.5 times it (640); adjust the range if the peak assumption changes. Delay rises steeply as utilisation nears 1.',
  ),
  block('ws-growth-mmc', {
    title: 'Mean and percentile queueing delay as traffic grows (proposed pool)',
    timeUnit: 'second',
    spec: {
      model: 'M/M/c',
      arrivalRate: use('peak_request_rate'),
      serviceRate: use('request_service_time'),
      servers: use('planned_worker_slots'),
      percentile: use('wait_percentile'),
    },
    scenarios: [],
    chart: { parameter: 'arrivalRate', from: 420, to: 640, steps: 12, measures: ['Wq', 'wqPercentile'] },
    shownMeasures: ['rho', 'Wq', 'wqPercentile'],
  }),

  heading(1, 'Bounded backlog and refused requests', 'ws-backlog'),
  para(
    i('Guidance: '),
    'the pool holds a limited number of requests (in service plus backlog) and refuses the rest. M/M/c/K gives the share refused. The chart shows how the share refused falls as the limit grows; a longer backlog refuses less but lets delay grow.',
  ),
  block('ws-backlog-mmck', {
    title: 'Requests refused with a bounded backlog (M/M/c/K)',
    timeUnit: 'second',
    spec: {
      model: 'M/M/c/K',
      arrivalRate: use('peak_request_rate'),
      serviceRate: use('request_service_time'),
      servers: use('worker_slots'),
      capacity: use('connection_limit'),
      percentile: use('wait_percentile'),
    },
    scenarios: [{ label: 'Surge at 1.3 times the peak', overrides: { arrivalRate: 546 } }],
    chart: { parameter: 'capacity', from: 32, to: 112, steps: 11, measures: ['probBlock'] },
    shownMeasures: ['rho', 'probBlock', 'effectiveArrivalRate', 'Wq', 'wqPercentile'],
  }),

  heading(1, 'Assumptions and limits', 'ws-limits'),
  bullets(
    'Requests arrive at random and steadily within the busiest minute; retries after errors and bursts beyond the measured variability make things worse.',
    'Each worker slot serves one request at a time and any slot can serve any request; sticky sessions or uneven balancing reduce effective capacity.',
    'Service time per slot does not grow with load; contention for shared resources (database, locks, CPU) makes it grow near saturation.',
    'The G/G/c and percentile figures are approximations; compare them with measured latency percentiles.',
    'Downstream components (databases, caches, external calls) are outside these blocks unless modelled separately.',
    'Capacity for an instance failing or a deployment taking instances out of rotation is not included unless the slots above allow for it.',
  ),

  heading(1, 'Cautions', 'ws-cautions'),
  ...cautionsParagraphs(),
);

export const webServiceHeadroom: StudyTemplate = {
  key: 'web-service-headroom',
  title: 'Web-service capacity headroom',
  description:
    'Headroom of an application tier behind a load balancer, in requests per second: utilisation and queueing delay at the peak, worker slots under a utilisation cap, variable service times (G/G/c, M/G/1), delay percentiles, growth and refused requests with a bounded backlog.',
  safetyCritical: false,
  assumptions: ASSUMPTIONS,
  document,
};
