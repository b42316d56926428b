/**
 * The built-in table: every name the language provides, as data. The checker, the compiler,
 * the editor's completion and hover, and the Language reference page all read this one table.
 */

/** What an argument must be. Lengths, angles and phases are constants unless the type says field. */
export type ParamType =
  | 'length'
  | 'angle'
  /** an angle-valued phase; a plain number is read as radians */
  | 'phase'
  | 'dimensionless'
  /** a whole number */
  | 'count'
  /** (x, y) lengths */
  | 'point'
  /** (x, y, z) lengths */
  | 'point3'
  | 'region'
  | 'text'
  /** a phase field (may vary with position), a complex field, for combinations */
  | 'profile'
  /** a phase field only: an angle or dimensionless expression that may vary with position */
  | 'phase field'
  /** one of `options`, written as a bare word */
  | 'word'
  /** a number of any dimension; the math rules say what comes out */
  | 'number';

export interface BuiltinParam {
  name: string;
  type: ParamType;
  /** default as source text, parsed by the compiler like any script text */
  default?: string;
  /** may be left out without a default (see `oneOf`) */
  optional?: boolean;
  options?: string[];
  doc: string;
}

export type BuiltinCategory =
  | 'profile'
  | 'combination'
  | 'region'
  | 'quantization'
  | 'label'
  | 'math'
  | 'coordinate'
  | 'constant';

/** How a math function's result type follows from its arguments. */
export type MathRule =
  | 'trig'
  | 'inverse-angle'
  | 'same'
  | 'sqrt'
  | 'pure'
  | 'modulo';

export type ReturnKind =
  | 'phase field'
  | 'complex field'
  | 'multiplexed'
  | 'region'
  | 'quantization'
  | 'label'
  | 'number'
  | 'length'
  | 'angle'
  | 'dimensionless';

export interface Builtin {
  name: string;
  category: BuiltinCategory;
  params: BuiltinParam[];
  /** positional arguments beyond `params` collect here (at least `min` of them) */
  variadic?: { name: string; type: ParamType; min: number; doc: string };
  /** each group: exactly one of these parameters must be given */
  oneOf?: string[][];
  returns: ReturnKind;
  rule?: MathRule;
  /** the formula in plain text, internal units */
  formula?: string;
  description: string;
  example: string;
}

const centre: BuiltinParam = { name: 'centre', type: 'point', default: '(0 um, 0 um)', doc: 'lateral position of the axis' };

export const BUILTINS: readonly Builtin[] = [
  // profiles
  {
    name: 'lens',
    category: 'profile',
    params: [{ name: 'focal', type: 'length', doc: 'focal length, > 0' }, centre],
    returns: 'phase field',
    formula: 'φ = −(2π/λ)(√((x−x0)² + (y−y0)² + f²) − f)',
    description: 'Focusing lens with the exact hyperbolic phase; its focus lies at distance focal behind the mask, above the centre.',
    example: 'profile lens(focal: 1 mm, centre: (40 um, 0 um))',
  },
  {
    name: 'lens_to',
    category: 'profile',
    params: [{ name: 'focus', type: 'point3', doc: 'focal point (x0, y0, z0), z0 > 0 behind the mask' }],
    returns: 'phase field',
    formula: 'φ = −(2π/λ)(√((x−x0)² + (y−y0)² + z0²) − z0)',
    description: 'The exact lens, given by the point it focuses to.',
    example: 'profile lens_to(focus: (30 um, -20 um, 800 um))',
  },
  {
    name: 'paraxial_lens',
    category: 'profile',
    params: [{ name: 'focal', type: 'length', doc: 'focal length, > 0' }, centre],
    returns: 'phase field',
    formula: 'φ = −π((x−x0)² + (y−y0)²)/(λf)',
    description: 'Quadratic (paraxial) lens, for comparison with the exact lens.',
    example: 'profile paraxial_lens(focal: 2 mm)',
  },
  {
    name: 'cylindrical_lens',
    category: 'profile',
    params: [
      { name: 'focal', type: 'length', doc: 'focal length, > 0' },
      { name: 'axis', type: 'angle', default: '0 deg', doc: 'direction of the focal line, from the x axis' },
      centre,
    ],
    returns: 'phase field',
    formula: 'u = −(x−x0)·sin a + (y−y0)·cos a;  φ = −(2π/λ)(√(u² + f²) − f)',
    description: 'Cylindrical lens focusing to a line parallel to the axis direction.',
    example: 'profile cylindrical_lens(focal: 1.5 mm, axis: 90 deg)',
  },
  {
    name: 'grating',
    category: 'profile',
    params: [
      { name: 'period', type: 'length', optional: true, doc: 'grating period Λ' },
      { name: 'angle', type: 'angle', optional: true, doc: 'first-order deflection angle θ; Λ = λ/sin θ' },
      { name: 'direction', type: 'angle', default: '0 deg', doc: 'direction the light is deflected towards, from the x axis' },
    ],
    oneOf: [['period', 'angle']],
    returns: 'phase field',
    formula: 'φ = 2π(x·cos d + y·sin d)/Λ',
    description: 'Linear phase (blazed grating profile), by period or by deflection angle.',
    example: 'tilt = grating(angle: 2 deg, direction: 90 deg)',
  },
  {
    name: 'vortex',
    category: 'profile',
    params: [{ name: 'charge', type: 'count', doc: 'topological charge, a whole number' }, centre],
    returns: 'phase field',
    formula: 'φ = m·atan2(y−y0, x−x0)',
    description: 'Spiral phase of topological charge m.',
    example: 'profile lens(focal: 1 mm) + vortex(charge: 2)',
  },
  {
    name: 'axicon',
    category: 'profile',
    params: [
      { name: 'angle', type: 'angle', optional: true, doc: 'deflection angle β towards the axis; Λ = λ/sin β' },
      { name: 'period', type: 'length', optional: true, doc: 'radial period Λ' },
      centre,
    ],
    oneOf: [['angle', 'period']],
    returns: 'phase field',
    formula: 'φ = −2π·√((x−x0)² + (y−y0)²)/Λ',
    description: 'Axicon: a conical phase that forms a long focal line along the axis.',
    example: 'profile axicon(angle: 1 deg)',
  },
  {
    name: 'phase_map',
    category: 'profile',
    params: [
      { name: 'name', type: 'text', doc: 'name of an uploaded phase map (CSV grid or 16-bit PNG)' },
      { name: 'scale', type: 'dimensionless', default: '1', doc: 'multiplies the map values' },
    ],
    returns: 'phase field',
    formula: 'bilinear interpolation of the map samples; the edge value outside the map',
    description: 'A sampled phase from a file, placed by the pitch and origin stored with it.',
    example: 'profile phase_map("logo-hologram") + lens(focal: 2 mm)',
  },
  // combinations
  {
    name: 'wave',
    category: 'combination',
    params: [
      { name: 'phase', type: 'phase field', doc: 'the phase of this part' },
      { name: 'weight', type: 'dimensionless', default: '1', doc: 'relative amplitude, ≥ 0' },
      { name: 'offset', type: 'phase', default: '0 rad', doc: 'constant phase added to this part' },
    ],
    returns: 'complex field',
    formula: 'w·exp(i(φ + c))',
    description: 'One weighted part of a combination.',
    example: 'near = wave(lens(focal: 800 um), weight: 0.6)',
  },
  {
    name: 'superpose',
    category: 'combination',
    params: [],
    variadic: { name: 'parts', type: 'profile', min: 2, doc: 'phases or waves' },
    returns: 'complex field',
    formula: 'u = Σ w_k·exp(i(φ_k + c_k)); the fabricated phase is arg u',
    description:
      'Multi-focus profile: the complex sum of several parts, whose argument is fabricated. Two parts of equal weight cancel along whole lines; the mask is drawn with the second weight 0.01 % lower so their zone edges are well defined (no edge moves by more than a fraction of a nanometre). Where weights are close but the quantization is not binary at duty 0.5, zone edges crowd together along those lines: keep the weights 10 % apart.',
    example: 'profile superpose(wave(lens(focal: 1 mm), weight: 2), lens(focal: 1.5 mm))',
  },
  {
    name: 'stripes',
    category: 'combination',
    params: [
      { name: 'period', type: 'length', doc: 'width of one stripe' },
      { name: 'direction', type: 'angle', default: '0 deg', doc: 'direction across the stripes, from the x axis' },
    ],
    variadic: { name: 'parts', type: 'profile', min: 2, doc: 'phases or combinations, one per stripe in turn' },
    returns: 'multiplexed',
    description: 'Spatial multiplexing: parallel stripes of the aperture take the parts in turn.',
    example: 'profile stripes(lens(focal: 1 mm), lens(focal: 1.4 mm), period: 20 um)',
  },
  {
    name: 'sectors',
    category: 'combination',
    params: [
      { name: 'count', type: 'count', doc: 'number of equal sectors around the centre' },
      centre,
    ],
    variadic: { name: 'parts', type: 'profile', min: 2, doc: 'phases or combinations, one per sector in turn' },
    returns: 'multiplexed',
    description: 'Spatial multiplexing: equal angular sectors take the parts in turn.',
    example: 'profile sectors(lens(focal: 1 mm), lens(focal: 1.4 mm), count: 8)',
  },
  // regions
  {
    name: 'circle',
    category: 'region',
    params: [
      { name: 'radius', type: 'length', optional: true, doc: 'radius' },
      { name: 'diameter', type: 'length', optional: true, doc: 'diameter' },
      centre,
    ],
    oneOf: [['radius', 'diameter']],
    returns: 'region',
    description: 'Disc.',
    example: 'aperture circle(diameter: 460 um)',
  },
  {
    name: 'ring',
    category: 'region',
    params: [
      { name: 'inner', type: 'length', doc: 'inner radius' },
      { name: 'outer', type: 'length', doc: 'outer radius' },
      centre,
    ],
    returns: 'region',
    description: 'Annulus between two radii.',
    example: 'aperture ring(inner: 40 um, outer: 230 um)',
  },
  {
    name: 'rectangle',
    category: 'region',
    params: [
      { name: 'width', type: 'length', doc: 'extent along x' },
      { name: 'height', type: 'length', doc: 'extent along y' },
      centre,
    ],
    returns: 'region',
    description: 'Axis-aligned rectangle.',
    example: 'aperture rectangle(width: 400 um, height: 300 um)',
  },
  {
    name: 'polygon',
    category: 'region',
    params: [],
    variadic: { name: 'corners', type: 'point', min: 3, doc: 'corner points in order' },
    returns: 'region',
    description: 'Simple polygon through the given corners.',
    example: 'aperture polygon((0 um, 0 um), (300 um, 0 um), (0 um, 300 um))',
  },
  {
    name: 'union',
    category: 'region',
    params: [],
    variadic: { name: 'regions', type: 'region', min: 2, doc: 'regions to join' },
    returns: 'region',
    description: 'Points in any of the regions.',
    example: 'aperture union(circle(radius: 100 um), circle(radius: 100 um, centre: (250 um, 0 um)))',
  },
  {
    name: 'intersection',
    category: 'region',
    params: [],
    variadic: { name: 'regions', type: 'region', min: 2, doc: 'regions to overlap' },
    returns: 'region',
    description: 'Points in every one of the regions.',
    example: 'aperture intersection(circle(radius: 230 um), rectangle(width: 400 um, height: 400 um))',
  },
  {
    name: 'difference',
    category: 'region',
    params: [],
    variadic: { name: 'regions', type: 'region', min: 2, doc: 'the first region, then the regions cut out of it' },
    returns: 'region',
    description: 'The first region minus all the others.',
    example: 'aperture difference(circle(radius: 230 um), circle(radius: 20 um))',
  },
  {
    name: 'shift',
    category: 'region',
    params: [
      { name: 'region', type: 'region', doc: 'region to move' },
      { name: 'by', type: 'point', doc: 'offset (dx, dy)' },
    ],
    returns: 'region',
    description: 'The region moved by an offset.',
    example: 'aperture shift(circle(radius: 200 um), by: (500 um, 0 um))',
  },
  // quantization
  {
    name: 'binary',
    category: 'quantization',
    params: [
      { name: 'duty', type: 'dimensionless', default: '0.5', doc: 'fraction of every 2π period in state 1, between 0 and 1' },
      { name: 'offset', type: 'phase', default: '0 rad', doc: 'phase at the centre of the state-1 band' },
      { name: 'modulation', type: 'word', options: ['amplitude', 'phase'], default: 'amplitude', doc: 'amplitude: state 1 transmits, state 0 is chrome; phase: state 1 is retarded by π' },
      { name: 'tone', type: 'word', options: ['positive', 'negative'], default: 'positive', doc: 'positive draws the state-1 zones, negative the state-0 zones' },
      { name: 'index', type: 'dimensionless', default: '1.5', doc: 'refractive index of the patterned material (phase step depth λ/(2(n−1)))' },
    ],
    returns: 'quantization',
    description: 'Two states: a zone plate (amplitude) or a binary phase plate.',
    example: 'quantize binary(duty: 0.5, modulation: amplitude, tone: positive)',
  },
  {
    name: 'multilevel',
    category: 'quantization',
    params: [
      { name: 'levels', type: 'count', default: '4', doc: 'number of phase levels, a power of two (2^N levels on N masks)' },
      { name: 'offset', type: 'phase', default: '0 rad', doc: 'phase at the start of level 0' },
      { name: 'index', type: 'dimensionless', default: '1.5', doc: 'refractive index; mask k etches λ/(2^k (n−1))' },
    ],
    returns: 'quantization',
    description: 'Multi-level phase: 2^N levels written as N binary masks on N layers.',
    example: 'quantize multilevel(levels: 4, index: 1.46)',
  },
  // label
  {
    name: 'text',
    category: 'label',
    params: [
      { name: 'content', type: 'text', doc: 'the words to write' },
      { name: 'at', type: 'point', doc: 'lower-left corner of the text' },
      { name: 'height', type: 'length', default: '10 um', doc: 'letter height' },
    ],
    returns: 'label',
    description: 'A text label drawn on the mask, e.g. to match a lens with its exposure parameters.',
    example: 'label text("ZP-405 f1", at: (-200 um, -280 um), height: 16 um)',
  },
  // math
  ...(
    [
      ['sin', 'trig', 'sine of an angle (or plain number in radians)'],
      ['cos', 'trig', 'cosine'],
      ['tan', 'trig', 'tangent'],
      ['atan2', 'inverse-angle', 'angle of the point (b, a) from the x axis: atan2(a, b)'],
      ['sqrt', 'sqrt', 'square root; halves the dimension (sqrt of an area is a length)'],
      ['exp', 'pure', 'exponential of a dimensionless number'],
      ['log', 'pure', 'natural logarithm of a dimensionless number'],
      ['abs', 'same', 'absolute value'],
      ['floor', 'same', 'largest whole number not above (in internal units: µm, rad)'],
      ['mod', 'modulo', 'remainder of a / b with the sign of b; same dimension'],
      ['min', 'same', 'smaller of two values of one dimension'],
      ['max', 'same', 'larger of two values of one dimension'],
      ['hypot', 'same', 'length of the vector (a, b): √(a² + b²)'],
    ] as const
  ).map(([name, rule, description]): Builtin => {
    const two = rule === 'inverse-angle' || rule === 'modulo' || name === 'min' || name === 'max' || name === 'hypot';
    const params: BuiltinParam[] = two
      ? [
          { name: 'a', type: 'number', doc: 'first value' },
          { name: 'b', type: 'number', doc: 'second value, same dimension' },
        ]
      : [{ name: 'u', type: 'number', doc: rule === 'trig' ? 'angle' : 'value' }];
    const examples: Record<string, string> = {
      sin: 'ripple = 0.5 * sin(2 * pi * x / 40 um)',
      atan2: 'spiral = 3 * atan2(y, x)',
      sqrt: 'rho = sqrt(x^2 + y^2)',
      mod: 'sawtooth = mod(x, 25 um) / 25 um * 2 * pi',
    };
    return {
      name,
      category: 'math',
      params,
      returns: 'number',
      rule,
      description,
      example: examples[name] ?? `v = ${name}(${params.map(() => '0.5').join(', ')})`,
    };
  }),
  // coordinates and constants
  { name: 'x', category: 'coordinate', params: [], returns: 'length', description: 'position on the mask along x', example: 'profile 2 * pi * x / 30 um' },
  { name: 'y', category: 'coordinate', params: [], returns: 'length', description: 'position on the mask along y', example: 'profile 2 * pi * y / 30 um' },
  { name: 'r', category: 'coordinate', params: [], returns: 'length', description: 'distance from the mask origin', example: 'profile -pi * r^2 / (wavelength * 1 mm)' },
  { name: 'theta', category: 'coordinate', params: [], returns: 'angle', description: 'polar angle around the mask origin, from the x axis', example: 'profile 2 * theta' },
  { name: 'pi', category: 'constant', params: [], returns: 'dimensionless', description: 'π = 3.14159…', example: 'half_turn = pi * 1 rad' },
  { name: 'wavelength', category: 'constant', params: [], returns: 'length', description: 'the declared design wavelength', example: 'k = 2 * pi / wavelength' },
];

/** What each declaration expects. */
export interface DeclarationInfo {
  keyword: string;
  expects: string;
  required: boolean;
  repeatable: boolean;
  description: string;
  example: string;
}

export const DECLARATIONS: readonly DeclarationInfo[] = [
  { keyword: 'wavelength', expects: 'length', required: true, repeatable: false, description: 'design wavelength', example: 'wavelength 405 nm' },
  { keyword: 'aperture', expects: 'region', required: true, repeatable: false, description: 'the area of the mask that carries the profile', example: 'aperture circle(diameter: 460 um)' },
  { keyword: 'profile', expects: 'phase field, complex field or multiplexed profile', required: true, repeatable: false, description: 'the phase to fabricate', example: 'profile lens(focal: 1 mm)' },
  { keyword: 'quantize', expects: 'quantization', required: true, repeatable: false, description: 'how the phase becomes fabricated states', example: 'quantize binary(duty: 0.5)' },
  { keyword: 'label', expects: 'label', required: false, repeatable: true, description: 'a text label on the mask (any number)', example: 'label text("L1", at: (0 um, -260 um))' },
];

const byName = new Map(BUILTINS.map((b) => [b.name, b]));

export function findBuiltin(name: string): Builtin | undefined {
  return byName.get(name);
}
