// Generated from the API's OpenAPI document by `npm run openapi:types`. Do not edit by hand:
// api/test/openapi-types.e2e-spec.ts fails when this file and the API disagree.
export interface paths {
  '/api/auth/csrf': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The CSRF token of this session (creates the session if needed) */
    get: operations['AuthController_csrf'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/register': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Create a customer account and sign in */
    post: operations['AuthController_register'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/sign-in': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Sign in; the session is regenerated and a new CSRF token returned */
    post: operations['AuthController_signIn'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/sign-out': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Sign out: the session is destroyed and the cookie cleared */
    post: operations['AuthController_signOut'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/me': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The signed-in user */
    get: operations['AuthController_me'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/password-reset': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** E-mail a reset link if the account exists (always 202) */
    post: operations['AuthController_requestPasswordReset'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/auth/password-reset/confirm': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Choose a new password with the token from the e-mail */
    post: operations['AuthController_confirmPasswordReset'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/staff': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Every account whose role is not customer */
    get: operations['StaffController_list'];
    put?: never;
    /** Create a staff account */
    post: operations['StaffController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/staff/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    /** Rename, change the role of, or switch off a staff account */
    patch: operations['StaffController_update'];
    trace?: never;
  };
  '/api/health/live': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The process is up */
    get: operations['HealthController_live'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/health/ready': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The database answers (503 otherwise) */
    get: operations['HealthController_ready'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/vehicle-models': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Search vehicle models by words (make, model, variant), make and year */
    get: operations['VehiclesController_list'];
    put?: never;
    /** Add a vehicle model */
    post: operations['VehiclesController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/vehicle-models/makes': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Every make, A to Z */
    get: operations['VehiclesController_makes'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/vehicle-models/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** A vehicle model's spec sheet */
    get: operations['VehiclesController_get'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    /** Change part of a vehicle model's spec sheet */
    patch: operations['VehiclesController_update'];
    trace?: never;
  };
  '/api/my/vehicles': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The signed-in customer's own vehicles */
    get: operations['CustomerVehiclesController_list'];
    put?: never;
    /** Add a vehicle to my vehicles */
    post: operations['CustomerVehiclesController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/my/vehicles/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    /** Change one of my vehicles (another customer's id is 404) */
    patch: operations['CustomerVehiclesController_update'];
    trace?: never;
  };
  '/api/products': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Products (active ones unless a manager asks for all); with vehicleModelId, each with its fit verdict */
    get: operations['ProductsController_list'];
    put?: never;
    /** Add a product (attributes validated for its kind) */
    post: operations['ProductsController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/products/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** One product (a switched-off one for managers only) */
    get: operations['ProductsController_get'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    /** Change a product (the result is validated as a whole) */
    patch: operations['ProductsController_update'];
    trace?: never;
  };
  '/api/catalogue/import/preview': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** What a CSV price list would change (new, updated, unchanged, rejected rows); writes nothing */
    post: operations['CatalogueCsvController_preview'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/catalogue/import/apply': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Write every new and updated row in one transaction (rejected rows are skipped and listed) */
    post: operations['CatalogueCsvController_apply'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/catalogue/export.csv': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The whole catalogue as a CSV price list (imports back as all unchanged) */
    get: operations['CatalogueCsvController_exportCsv'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/fitment/tyre-size': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Read a tyre designation: the parsed size and its nominal dimensions */
    get: operations['FitReportsController_tyreSize'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/fitment/check': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The fit report of a package on a vehicle model, against a rule set */
    post: operations['FitReportsController_check'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/rule-sets': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Every rule set (modification limits per jurisdiction), default first */
    get: operations['RuleSetsController_list'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/rule-sets/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** One rule set */
    get: operations['RuleSetsController_get'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    /** Switch rules on or off and change their values (each keeps its source) */
    patch: operations['RuleSetsController_update'];
    trace?: never;
  };
}
export type webhooks = Record<string, never>;
export interface components {
  schemas: {
    ErrorResponse: {
      /** @example 400 */
      statusCode: number;
      /** @example Bad Request */
      error: string;
      /** @example Some fields are not valid */
      message: string;
      /**
       * @description Only for validation errors: messages per field, nested fields as "a.b"
       * @example {
       *       "email": [
       *         "must be an e-mail address"
       *       ]
       *     }
       */
      fieldErrors?: {
        [key: string]: string[];
      };
      /** @example 0b7e3c1e-8d55-4a53-9d8e-0c2b1f1f3a10 */
      requestId: string;
    };
    CsrfTokenResponse: {
      /** @description Send it in the x-csrf-token header of every POST, PUT, PATCH and DELETE */
      csrfToken: string;
    };
    RegisterDto: {
      /** @example customer@liftwright.example */
      email: string;
      /** Format: password */
      password: string;
      /** @example Robin Yarrow */
      name: string;
    };
    /** @enum {string} */
    Role: 'customer' | 'desk' | 'tech' | 'manager';
    UserResponse: {
      /** Format: uuid */
      id: string;
      /** @example customer@liftwright.example */
      email: string;
      /** @example Robin Yarrow */
      name: string;
      role: components['schemas']['Role'];
    };
    AuthSessionResponse: {
      user: components['schemas']['UserResponse'];
      csrfToken: string;
    };
    SignInDto: {
      /** @example customer@liftwright.example */
      email: string;
      /** Format: password */
      password: string;
    };
    MeResponse: {
      user: components['schemas']['UserResponse'];
    };
    RequestPasswordResetDto: {
      /** @example customer@liftwright.example */
      email: string;
    };
    ConfirmPasswordResetDto: {
      /** @description The token from the e-mailed link */
      token: string;
      /** Format: password */
      password: string;
    };
    /** @enum {string} */
    StaffRole: 'desk' | 'tech' | 'manager';
    StaffMemberResponse: {
      /** Format: uuid */
      id: string;
      /** @example desk@liftwright.example */
      email: string;
      /** @example Bea Corran */
      name: string;
      role: components['schemas']['StaffRole'];
      active: boolean;
      /** Format: date-time */
      createdAt: string;
    };
    StaffListResponse: {
      items: components['schemas']['StaffMemberResponse'][];
    };
    CreateStaffMemberDto: {
      /** @example customer@liftwright.example */
      email: string;
      /** @example Bea Corran */
      name: string;
      role: components['schemas']['StaffRole'];
      /** Format: password */
      password: string;
    };
    UpdateStaffMemberDto: {
      name?: string;
      role?: components['schemas']['StaffRole'];
      active?: boolean;
    };
    /** @enum {string} */
    BodyType: 'ute' | 'wagon';
    /** @enum {string} */
    FrontSuspensionKind: 'independent' | 'solid-axle';
    /** @enum {string} */
    RearSuspensionKind: 'leaf' | 'coil' | 'independent';
    StockWheelResponse: {
      /** @example 17 */
      diameterIn: number;
      /** @example 7.5 */
      widthIn: number;
      /** @example 30 */
      offsetMm: number;
    };
    /** @enum {string} */
    SpeedSymbol: 'L' | 'M' | 'N' | 'P' | 'Q' | 'R' | 'S' | 'T' | 'U' | 'H' | 'V' | 'W' | 'Y';
    VehicleModelResponse: {
      /** Format: uuid */
      id: string;
      /** @example Vantrel */
      make: string;
      /** @example Strata */
      model: string;
      /** @example SR dual cab */
      variant: string;
      /** @example 2016 */
      yearFrom: number;
      /** @example 2024 */
      yearTo: number;
      bodyType: components['schemas']['BodyType'];
      frontSuspension: components['schemas']['FrontSuspensionKind'];
      rearSuspension: components['schemas']['RearSuspensionKind'];
      /** @example 6x139.7 */
      boltPattern: string;
      /** @example M12x1.5 */
      studThread: string;
      /** @example 106.1 */
      centreBoreMm: number;
      /** @example 265/65R17 112S */
      stockTyre: string;
      /** @example null */
      largestSpecifiedTyre: string | null;
      stockWheel: components['schemas']['StockWheelResponse'];
      /** @example 3100 */
      gvmKg: number;
      /** @example 1330 */
      frontAxleKg: number;
      /** @example 1870 */
      rearAxleKg: number;
      /** @example 2110 */
      kerbMassKg: number;
      /** @example 112 */
      placardLoadIndex: number;
      /** @example S */
      placardSpeedSymbol: components['schemas']['SpeedSymbol'];
      /** @example 455 */
      frontHalfShaftLengthMm: number | null;
      offRoadCategory: boolean;
      /** @example 180 */
      topSpeedKmh: number | null;
    };
    VehicleModelListResponse: {
      items: components['schemas']['VehicleModelResponse'][];
    };
    VehicleMakesResponse: {
      /**
       * @example [
       *       "Brellin",
       *       "Korrabin",
       *       "Oskerra",
       *       "Vantrel"
       *     ]
       */
      items: string[];
    };
    StockWheelDto: {
      /** @example 17 */
      diameterIn: number;
      /** @example 7.5 */
      widthIn: number;
      /**
       * @description Offset (ET), mm
       * @example 30
       */
      offsetMm: number;
    };
    CreateVehicleModelDto: {
      /** @example Vantrel */
      make: string;
      /** @example Strata */
      model: string;
      /** @example SR dual cab */
      variant: string;
      /** @example 2016 */
      yearFrom: number;
      /** @example 2024 */
      yearTo: number;
      bodyType: components['schemas']['BodyType'];
      frontSuspension: components['schemas']['FrontSuspensionKind'];
      rearSuspension: components['schemas']['RearSuspensionKind'];
      /**
       * @description Stud count x pitch circle diameter (mm)
       * @example 6x139.7
       */
      boltPattern: string;
      /** @example M12x1.5 */
      studThread: string;
      /**
       * @description Hub spigot, mm
       * @example 106.1
       */
      centreBoreMm: number;
      /**
       * @description Stored in canonical form
       * @example 265/65R17 112S
       */
      stockTyre: string;
      /**
       * @description Largest tyre the maker specifies (base of the diameter limit); null: the stock tyre
       * @example 265/70R17 115S
       */
      largestSpecifiedTyre?: string | null;
      stockWheel: components['schemas']['StockWheelDto'];
      /** @example 3100 */
      gvmKg: number;
      /** @example 1330 */
      frontAxleKg: number;
      /** @example 1870 */
      rearAxleKg: number;
      /** @example 2110 */
      kerbMassKg: number;
      /** @example 112 */
      placardLoadIndex: number;
      /** @example S */
      placardSpeedSymbol: components['schemas']['SpeedSymbol'];
      /** @example 455 */
      frontHalfShaftLengthMm?: number | null;
      /** @description Has off-road features (off-road passenger vehicle category) */
      offRoadCategory: boolean;
      /** @example 180 */
      topSpeedKmh?: number | null;
    };
    UpdateVehicleModelDto: {
      /** @example Vantrel */
      make?: string;
      /** @example Strata */
      model?: string;
      /** @example SR dual cab */
      variant?: string;
      /** @example 2016 */
      yearFrom?: number;
      /** @example 2024 */
      yearTo?: number;
      bodyType?: components['schemas']['BodyType'];
      frontSuspension?: components['schemas']['FrontSuspensionKind'];
      rearSuspension?: components['schemas']['RearSuspensionKind'];
      /**
       * @description Stud count x pitch circle diameter (mm)
       * @example 6x139.7
       */
      boltPattern?: string;
      /** @example M12x1.5 */
      studThread?: string;
      /**
       * @description Hub spigot, mm
       * @example 106.1
       */
      centreBoreMm?: number;
      /**
       * @description Stored in canonical form
       * @example 265/65R17 112S
       */
      stockTyre?: string;
      /**
       * @description Largest tyre the maker specifies (base of the diameter limit); null: the stock tyre
       * @example 265/70R17 115S
       */
      largestSpecifiedTyre?: string | null;
      stockWheel?: components['schemas']['StockWheelDto'];
      /** @example 3100 */
      gvmKg?: number;
      /** @example 1330 */
      frontAxleKg?: number;
      /** @example 1870 */
      rearAxleKg?: number;
      /** @example 2110 */
      kerbMassKg?: number;
      /** @example 112 */
      placardLoadIndex?: number;
      /** @example S */
      placardSpeedSymbol?: components['schemas']['SpeedSymbol'];
      /** @example 455 */
      frontHalfShaftLengthMm?: number | null;
      /** @description Has off-road features (off-road passenger vehicle category) */
      offRoadCategory?: boolean;
      /** @example 180 */
      topSpeedKmh?: number | null;
    };
    CustomerVehicleResponse: {
      /** Format: uuid */
      id: string;
      /** Format: uuid */
      vehicleModelId: string;
      /** @description The model's spec sheet */
      vehicleModel: components['schemas']['VehicleModelResponse'];
      nickname: string | null;
      rego: string | null;
      year: number | null;
      /** Format: date-time */
      createdAt: string;
    };
    CustomerVehicleListResponse: {
      items: components['schemas']['CustomerVehicleResponse'][];
    };
    CreateCustomerVehicleDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /** @example The work ute */
      nickname?: string | null;
      /**
       * @description Registration plate; stored in capitals
       * @example TGX 42K
       */
      rego?: string | null;
      /**
       * @description Model year, within the model's years
       * @example 2019
       */
      year?: number | null;
    };
    UpdateCustomerVehicleDto: {
      /** Format: uuid */
      vehicleModelId?: string;
      /** @example The work ute */
      nickname?: string | null;
      /**
       * @description Registration plate; stored in capitals
       * @example TGX 42K
       */
      rego?: string | null;
      /**
       * @description Model year, within the model's years
       * @example 2019
       */
      year?: number | null;
    };
    WheelAttributesDto: {
      /**
       * @description Rim diameter, inches
       * @example 17
       */
      diameterIn: number;
      /**
       * @description Rim width, inches
       * @example 8
       */
      widthIn: number;
      /**
       * @description Offset (ET), mm
       * @example 20
       */
      offsetMm: number;
      /**
       * @description Stud count x pitch circle diameter (mm)
       * @example 6x139.7
       */
      boltPattern: string;
      /**
       * @description Centre bore, mm
       * @example 106.1
       */
      centreBoreMm: number;
      /**
       * @description Wheel nut thread
       * @example M12x1.5
       */
      studThread: string;
      /**
       * @description Rated load per wheel, kg
       * @example 1250
       */
      loadRatingKg: number;
    };
    /** @enum {string} */
    TreadType: 'highway' | 'all-terrain' | 'mud-terrain';
    TyreAttributesDto: {
      /**
       * @description Size and service description (load index and speed symbol required); stored in canonical form
       * @example LT285/70R17 121/118Q
       */
      designation: string;
      treadType: components['schemas']['TreadType'];
      /** @description Tyre maker's narrowest approved rim, inches */
      approvedRimWidthMinIn?: number;
      /** @description Tyre maker's widest approved rim, inches */
      approvedRimWidthMaxIn?: number;
    };
    SuspensionKitAttributesDto: {
      /**
       * @description Lift at the front wheels, mm
       * @example 50
       */
      frontLiftMm: number;
      /**
       * @description Lift at the rear wheels, mm
       * @example 50
       */
      rearLiftMm: number;
      /**
       * @description Rated constant load from, kg
       * @example 0
       */
      constantLoadMinKg: number;
      /**
       * @description Rated constant load up to, kg
       * @example 150
       */
      constantLoadMaxKg: number;
      /** @description Keeps at least two thirds of the original suspension travel */
      keepsTwoThirdsTravel: boolean;
      includesGreasableShackles: boolean;
      includesExtendedBrakeLines: boolean;
    };
    /** @enum {string} */
    ComponentRole:
      | 'diff-drop'
      | 'greasable-shackles'
      | 'extended-brake-lines'
      | 'steering-damper'
      | 'hub-rings'
      | 'accessory';
    ComponentAttributesDto: {
      role: components['schemas']['ComponentRole'];
      /** @description Diff drops only: how far the front differential is lowered, mm */
      diffDropMm?: number;
      /** @description Mass added to the vehicle, kg (counted against the GVM) */
      massKg?: number;
    };
    /** @enum {string} */
    ServiceRole:
      | 'alignment'
      | 'fitting-balancing'
      | 'tyre-disposal'
      | 'headlight-re-aim'
      | 'speedometer-recalibration';
    ServiceAttributesDto: {
      role: components['schemas']['ServiceRole'];
      /** @description Priced per wheel (fitting and balancing, tyre disposal) */
      perWheel: boolean;
    };
    /** @enum {string} */
    ProductKind: 'wheel' | 'tyre' | 'suspension-kit' | 'component' | 'service';
    /** @enum {string} */
    BayKind: 'hoist' | 'alignment' | 'tyre';
    /** @enum {string} */
    FitVerdict: 'does-not-fit' | 'needs-certification' | 'advisory' | 'ok';
    ProductFitResponse: {
      verdict: components['schemas']['FitVerdict'];
      /** @example Does not fit: The wheel's 6x114.3 bolt pattern does not match the vehicle's 6x139.7: it cannot be bolted on. */
      summary: string;
    };
    ProductWithFitResponse: {
      /** Format: uuid */
      id: string;
      /** @example BR-STR-50-M */
      sku: string;
      kind: components['schemas']['ProductKind'];
      name: string;
      brand: string;
      description: string;
      /**
       * @description Integer cents, tax included
       * @example 189500
       */
      priceCents: number;
      /** @example 240 */
      labourMinutes: number;
      bayKind: components['schemas']['BayKind'] | null;
      /** @example 4 */
      stockQty: number;
      /** @example 0 */
      leadDays: number;
      active: boolean;
      /** @description Empty: any vehicle */
      fitsVehicleModelIds: string[];
      /** @description Per kind: wheel, tyre, suspension-kit, component or service attributes (validated for the kind; errors as "attributes.<field>") */
      attributes:
        | components['schemas']['WheelAttributesDto']
        | components['schemas']['TyreAttributesDto']
        | components['schemas']['SuspensionKitAttributesDto']
        | components['schemas']['ComponentAttributesDto']
        | components['schemas']['ServiceAttributesDto'];
      /** @description Only with vehicleModelId: this product alone on the vehicle's stock set-up */
      fit?: components['schemas']['ProductFitResponse'];
    };
    ProductListResponse: {
      items: components['schemas']['ProductWithFitResponse'][];
    };
    ProductResponse: {
      /** Format: uuid */
      id: string;
      /** @example BR-STR-50-M */
      sku: string;
      kind: components['schemas']['ProductKind'];
      name: string;
      brand: string;
      description: string;
      /**
       * @description Integer cents, tax included
       * @example 189500
       */
      priceCents: number;
      /** @example 240 */
      labourMinutes: number;
      bayKind: components['schemas']['BayKind'] | null;
      /** @example 4 */
      stockQty: number;
      /** @example 0 */
      leadDays: number;
      active: boolean;
      /** @description Empty: any vehicle */
      fitsVehicleModelIds: string[];
      /** @description Per kind: wheel, tyre, suspension-kit, component or service attributes (validated for the kind; errors as "attributes.<field>") */
      attributes:
        | components['schemas']['WheelAttributesDto']
        | components['schemas']['TyreAttributesDto']
        | components['schemas']['SuspensionKitAttributesDto']
        | components['schemas']['ComponentAttributesDto']
        | components['schemas']['ServiceAttributesDto'];
    };
    CreateProductDto: {
      /**
       * @description Upper-case letters, digits and hyphens
       * @example BR-STR-50-M
       */
      sku: string;
      kind: components['schemas']['ProductKind'];
      /** @example Strata 50 mm kit, medium load */
      name: string;
      /** @example Bramblerock */
      brand: string;
      /**
       * @description Price including tax, integer cents
       * @example 189500
       */
      priceCents: number;
      /** @description Per kind: wheel, tyre, suspension-kit, component or service attributes (validated for the kind; errors as "attributes.<field>") */
      attributes:
        | components['schemas']['WheelAttributesDto']
        | components['schemas']['TyreAttributesDto']
        | components['schemas']['SuspensionKitAttributesDto']
        | components['schemas']['ComponentAttributesDto']
        | components['schemas']['ServiceAttributesDto'];
      /** @example 240 */
      labourMinutes?: number;
      bayKind?: components['schemas']['BayKind'] | null;
      /** @example 4 */
      stockQty?: number;
      /**
       * @description Days to get it in when out of stock
       * @example 0
       */
      leadDays?: number;
      active?: boolean;
      /** @default  */
      description: string;
      /**
       * @description Vehicle models it is made for; empty: any vehicle (the fit report decides)
       * @default []
       */
      fitsVehicleModelIds: string[];
    };
    UpdateProductDto: {
      /**
       * @description Upper-case letters, digits and hyphens
       * @example BR-STR-50-M
       */
      sku?: string;
      kind?: components['schemas']['ProductKind'];
      /** @example Strata 50 mm kit, medium load */
      name?: string;
      /** @example Bramblerock */
      brand?: string;
      /**
       * @description Price including tax, integer cents
       * @example 189500
       */
      priceCents?: number;
      /** @description Per kind: wheel, tyre, suspension-kit, component or service attributes (validated for the kind; errors as "attributes.<field>") */
      attributes?:
        | components['schemas']['WheelAttributesDto']
        | components['schemas']['TyreAttributesDto']
        | components['schemas']['SuspensionKitAttributesDto']
        | components['schemas']['ComponentAttributesDto']
        | components['schemas']['ServiceAttributesDto'];
      /** @example 240 */
      labourMinutes?: number;
      bayKind?: components['schemas']['BayKind'] | null;
      /** @example 4 */
      stockQty?: number;
      /**
       * @description Days to get it in when out of stock
       * @example 0
       */
      leadDays?: number;
      active?: boolean;
      /** @default  */
      description: string;
      /**
       * @description Vehicle models it is made for; empty: any vehicle (the fit report decides)
       * @default []
       */
      fitsVehicleModelIds: string[];
    };
    FieldChangeResponse: {
      /** @description Stored value (product field, e.g. priceCents in cents) */
      from: Record<string, never>;
      /** @description Value from the file */
      to: Record<string, never>;
    };
    ImportSummaryResponse: {
      /** @example 2 */
      new: number;
      /** @example 5 */
      updated: number;
      /** @example 40 */
      unchanged: number;
      /** @example 1 */
      rejected: number;
    };
    /** @enum {string} */
    ImportRowStatus: 'new' | 'updated' | 'unchanged' | 'rejected';
    ImportRowResponse: {
      /**
       * @description Line of the file (the header is line 1)
       * @example 3
       */
      line: number;
      /**
       * @description As written in the file
       * @example BR-STR-50-M
       */
      sku: string;
      status: components['schemas']['ImportRowStatus'];
      /**
       * @description Rejected rows: why
       * @example price has more than 2 decimals
       */
      reason?: string;
      /**
       * @description Updated rows: each changed product field (API field names)
       * @example {
       *       "priceCents": {
       *         "from": 189500,
       *         "to": 194900
       *       }
       *     }
       */
      changes?: {
        [key: string]: components['schemas']['FieldChangeResponse'];
      };
    };
    ImportPreviewResponse: {
      summary: components['schemas']['ImportSummaryResponse'];
      rows: components['schemas']['ImportRowResponse'][];
    };
    ImportApplyResponse: {
      summary: components['schemas']['ImportSummaryResponse'];
      rows: components['schemas']['ImportRowResponse'][];
    };
    TyreGeometryResponse: {
      /** @example 265 */
      sectionWidthMm: number;
      /** @example 185.5 */
      sidewallHeightMm: number;
      /** @example 431.8 */
      rimDiameterMm: number;
      /** @example 802.8 */
      overallDiameterMm: number;
      /** @example 31.61 */
      overallDiameterIn: number;
      /** @example 2522.1 */
      circumferenceMm: number;
      /** @example 396.5 */
      revolutionsPerKm: number;
      /** @example 70 */
      aspectRatioPercent: number;
    };
    TyreSizeResponse: {
      /**
       * @description The canonical designation
       * @example 265/70R17 115T
       */
      designation: string;
      /**
       * @description The parsed size: kind "metric" (serviceType, sectionWidthMm, aspectRatioPercent, construction, zRatedMarking, rimDiameterIn) or "flotation" (overallDiameterIn, sectionWidthIn, construction, rimDiameterIn, lightTruck), with loadIndexSingle, loadIndexDual and speedSymbol (null when not given)
       * @example {
       *       "kind": "metric",
       *       "serviceType": "unmarked",
       *       "sectionWidthMm": 265,
       *       "aspectRatioPercent": 70,
       *       "construction": "radial",
       *       "zRatedMarking": false,
       *       "rimDiameterIn": 17,
       *       "loadIndexSingle": 115,
       *       "loadIndexDual": null,
       *       "speedSymbol": "T"
       *     }
       */
      size: {
        [key: string]: unknown;
      };
      /** @description Nominal dimensions (ISO 4000-1 / ETRTO), rounded to 0.1 mm (inches to 0.01) */
      geometry: components['schemas']['TyreGeometryResponse'];
    };
    CheckFitmentDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /** @description The package: at most one wheel, one tyre and one suspension kit, plus components and services */
      productIds: string[];
      /**
       * @description Permanent extra load, kg (drawers, canopy, water, tools)
       * @example 250
       */
      constantLoadKg?: number;
      /**
       * Format: uuid
       * @description Rule set to apply; the default one when absent
       */
      ruleSetId?: string;
    };
    /** @enum {string} */
    FitCheckCode:
      | 'tyre-designation'
      | 'bolt-pattern'
      | 'centre-bore'
      | 'stud-thread'
      | 'wheel-load-rating'
      | 'rim-diameter'
      | 'rim-width'
      | 'tyre-load-capacity'
      | 'speed-symbol'
      | 'tyre-diameter-change'
      | 'speedometer'
      | 'tyre-clearance'
      | 'suspension-lift'
      | 'combined-lift'
      | 'wheel-track-change'
      | 'joint-angle'
      | 'spring-rating'
      | 'gross-vehicle-mass'
      | 'alignment';
    /** @enum {string} */
    RuleKey:
      | 'boltPatternMatch'
      | 'centreBoreFit'
      | 'studThreadMatch'
      | 'wheelLoadRating'
      | 'tyreLoadCapacity'
      | 'passengerTyreLightTruckDerateFactor'
      | 'placardSpeedSymbolEnforced'
      | 'minSpeedKmhOther'
      | 'minSpeedKmhOffRoad'
      | 'speedSymbolOffRoadExemption'
      | 'rimDiameterMatch'
      | 'rimWidthForSection'
      | 'tyreDiameterIncreaseMaxMm'
      | 'tyreDiameterIncreaseMaxMmOther'
      | 'tyreDiameterDecreaseMaxMm'
      | 'diameterChangeMaxPercent'
      | 'speedometerAccuracy'
      | 'clearanceAllowanceMmPer25mmLift'
      | 'suspensionLiftMaxMm'
      | 'combinedLiftMaxMm'
      | 'jointAngleThresholdDeg'
      | 'alignmentAfterChange'
      | 'springRatingForLoad'
      | 'brakeLineLiftThresholdMm'
      | 'trackIncreaseMaxMm'
      | 'wheelSpacersProhibited'
      | 'grossVehicleMass'
      | 'occupantAllowanceKg';
    FitRuleResponse: {
      /** @description Source text of the rule(s) that decided the verdict */
      source: string;
      keys: components['schemas']['RuleKey'][];
    };
    FitCheckResponse: {
      code: components['schemas']['FitCheckCode'];
      verdict: components['schemas']['FitVerdict'];
      /** @description Plain words a customer can read */
      message: string;
      /**
       * @description The values behind the verdict, rounded to 0.1, with the unit in the key
       * @example {
       *       "stockDiameterMm": 776.3,
       *       "newDiameterMm": 830.8,
       *       "increaseOverBaseMm": 54.5
       *     }
       */
      numbers: {
        [key: string]: number;
      };
      rule: components['schemas']['FitRuleResponse'];
    };
    /** @enum {string} */
    SkipReason: 'disabled-by-rule-set' | 'not-applicable' | 'missing-data';
    SkippedCheckResponse: {
      code: components['schemas']['FitCheckCode'];
      reason: components['schemas']['SkipReason'];
      message: string;
    };
    FitMetricsResponse: {
      /** @example 776.3 */
      stockDiameterMm: number | null;
      /** @example 802.8 */
      newDiameterMm: number | null;
      /** @example 26.5 */
      diameterChangeMm: number | null;
      /** @example 3.4 */
      diameterChangePercent: number | null;
      /** @example 96.7 */
      speedometerAtTrue100Kmh: number | null;
      groundClearanceGainMm: number | null;
      groundClearanceGainFrontMm: number | null;
      groundClearanceGainRearMm: number | null;
      /** @example 63.3 */
      combinedLiftMm: number;
      /** @example 20 */
      trackChangeMm: number;
      /** @example 22.7 */
      outerEdgeChangePerSideMm: number;
      /** @example 6.3 */
      jointAngleAddedDeg: number | null;
    };
    /** @enum {string} */
    AdditionRole:
      | 'diff-drop'
      | 'alignment'
      | 'hub-rings'
      | 'greasable-shackles'
      | 'extended-brake-lines'
      | 'steering-damper'
      | 'headlight-re-aim'
      | 'speedometer-recalibration'
      | 'spring-rating';
    SuggestedAdditionResponse: {
      role: components['schemas']['AdditionRole'];
      reason: string;
      /** @description true: the package is not complete without it (added as a line) */
      required: boolean;
      /**
       * Format: uuid
       * @description Spring rating: the product id of the kit rating that covers the load
       */
      variantId?: string;
      /**
       * @description The values behind the verdict, rounded to 0.1, with the unit in the key
       * @example {
       *       "stockDiameterMm": 776.3,
       *       "newDiameterMm": 830.8,
       *       "increaseOverBaseMm": 54.5
       *     }
       */
      numbers?: {
        [key: string]: number;
      };
    };
    /** @enum {string} */
    CautionCode:
      | 'guide-only'
      | 'handling-and-rollover'
      | 'modification-limits'
      | 'insurer'
      | 'wheel-nut-retorque'
      | 'qualified-fitting';
    CautionResponse: {
      code: components['schemas']['CautionCode'];
      message: string;
    };
    FitReportResponse: {
      /** @description The worst verdict of the checks that ran */
      verdict: components['schemas']['FitVerdict'];
      /** @example National code defaults */
      ruleSetName: string;
      checks: components['schemas']['FitCheckResponse'][];
      skippedChecks: components['schemas']['SkippedCheckResponse'][];
      metrics: components['schemas']['FitMetricsResponse'];
      suggestedAdditions: components['schemas']['SuggestedAdditionResponse'][];
      cautions: components['schemas']['CautionResponse'][];
    };
    RuleLimitResponse: {
      /** @description false: the rule is switched off and its check does not run */
      enabled: boolean;
      /**
       * @description null for a switch (a rule without a number)
       * @example 50
       */
      value: number | null;
      /**
       * @description null for a switch
       * @example mm
       */
      unit: string | null;
      /** @description The rule's published source, quoted in the fit report */
      source: string;
      /** @example Largest suspension raise or lowering without certification */
      label: string;
    };
    RuleLimitPatch: {
      enabled?: boolean;
      /**
       * @description Numeric rules only
       * @example 40
       */
      value?: number;
    };
    RuleSetResponse: {
      /** Format: uuid */
      id: string;
      /** @example National code defaults */
      name: string;
      /** @example AU (VSB 14 Section LS and state codes as quoted) */
      jurisdiction: string;
      description: string;
      /** @description Used by the fit report when no rule set is named */
      isDefault: boolean;
      /** @description Every rule key, in report order */
      limits: {
        [key: string]: components['schemas']['RuleLimitResponse'];
      };
    };
    RuleSetListResponse: {
      items: components['schemas']['RuleSetResponse'][];
    };
    UpdateRuleSetDto: {
      /**
       * @description Rule key → { enabled?, value? }. Unknown keys, and a value for a switch, are refused.
       * @example {
       *       "suspensionLiftMaxMm": {
       *         "value": 40
       *       },
       *       "diameterChangeMaxPercent": {
       *         "enabled": true
       *       }
       *     }
       */
      limits: {
        [key: string]: components['schemas']['RuleLimitPatch'];
      };
    };
  };
  responses: never;
  parameters: never;
  requestBodies: never;
  headers: never;
  pathItems: never;
}
export type $defs = Record<string, never>;
export interface operations {
  AuthController_csrf: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['CsrfTokenResponse'];
        };
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_register: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['RegisterDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['AuthSessionResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description E-mail already registered */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_signIn: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['SignInDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['AuthSessionResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description E-mail or password is not right */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Throttled; see Retry-After */
      429: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_signOut: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      204: {
        headers: {
          [name: string]: unknown;
        };
        content?: never;
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_me: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['MeResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_requestPasswordReset: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['RequestPasswordResetDto'];
      };
    };
    responses: {
      202: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': Record<string, never>;
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  AuthController_confirmPasswordReset: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['ConfirmPasswordResetDto'];
      };
    };
    responses: {
      204: {
        headers: {
          [name: string]: unknown;
        };
        content?: never;
      };
      /** @description fieldErrors.token when the link expired or was used */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Missing or invalid CSRF token (POST) */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  StaffController_list: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['StaffListResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  StaffController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateStaffMemberDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['StaffMemberResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description E-mail already registered */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  StaffController_update: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateStaffMemberDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['StaffMemberResponse'];
        };
      };
      /** @description Invalid fields, or demoting/deactivating yourself */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  HealthController_live: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      /** @description The Health Check is successful */
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': {
            /** @example ok */
            status?: string;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            info?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /** @example {} */
            error?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            details?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            };
          };
        };
      };
      /** @description The Health Check is not successful */
      503: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': {
            /** @example error */
            status?: string;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            info?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "redis": {
             *         "status": "down",
             *         "message": "Could not connect"
             *       }
             *     }
             */
            error?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       },
             *       "redis": {
             *         "status": "down",
             *         "message": "Could not connect"
             *       }
             *     }
             */
            details?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            };
          };
        };
      };
    };
  };
  HealthController_ready: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      /** @description The Health Check is successful */
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': {
            /** @example ok */
            status?: string;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            info?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /** @example {} */
            error?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            details?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            };
          };
        };
      };
      /** @description The Health Check is not successful */
      503: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': {
            /** @example error */
            status?: string;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       }
             *     }
             */
            info?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "redis": {
             *         "status": "down",
             *         "message": "Could not connect"
             *       }
             *     }
             */
            error?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            } | null;
            /**
             * @example {
             *       "database": {
             *         "status": "up"
             *       },
             *       "redis": {
             *         "status": "down",
             *         "message": "Could not connect"
             *       }
             *     }
             */
            details?: {
              [key: string]: {
                status: string;
              } & {
                [key: string]: unknown;
              };
            };
          };
        };
      };
    };
  };
  VehiclesController_list: {
    parameters: {
      query?: {
        /** @description Words matched against make, model and variant (any case) */
        q?: string;
        /** @description Exact make (any case) */
        make?: string;
        /** @description Model year within yearFrom..yearTo */
        year?: number;
      };
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['VehicleModelListResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  VehiclesController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateVehicleModelDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['VehicleModelResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Same make, model and variant */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  VehiclesController_makes: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['VehicleMakesResponse'];
        };
      };
    };
  };
  VehiclesController_get: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['VehicleModelResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  VehiclesController_update: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateVehicleModelDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['VehicleModelResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Same make, model and variant */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CustomerVehiclesController_list: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['CustomerVehicleListResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CustomerVehiclesController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateCustomerVehicleDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['CustomerVehicleResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CustomerVehiclesController_update: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateCustomerVehicleDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['CustomerVehicleResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  ProductsController_list: {
    parameters: {
      query?: {
        /** @description Only products made for this vehicle model, each with its fit verdict on the vehicle's stock set-up */
        vehicleModelId?: string;
        kind?: components['schemas']['ProductKind'];
        /** @description Words matched against SKU, name and brand (any case) */
        q?: string;
        /** @description Managers only: include switched-off products */
        includeInactive?: boolean;
        /** @description With vehicleModelId: the declared constant load, kg, for the kits' spring-rating verdicts (0 when absent) */
        constantLoadKg?: number;
      };
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ProductListResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description includeInactive=true by anyone but a manager */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  ProductsController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateProductDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ProductResponse'];
        };
      };
      /** @description fieldErrors such as "attributes.offsetMm" */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description SKU taken */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  ProductsController_get: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ProductResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  ProductsController_update: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateProductDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ProductResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description SKU taken */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CatalogueCsvController_preview: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'multipart/form-data': {
          /**
           * Format: binary
           * @description CSV price list, at most 1 MB, columns sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes
           */
          file: string;
        };
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ImportPreviewResponse'];
        };
      };
      /** @description Not a CSV, missing columns, or no valid row */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Over 1 MB */
      413: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CatalogueCsvController_apply: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'multipart/form-data': {
          /**
           * Format: binary
           * @description CSV price list, at most 1 MB, columns sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes
           */
          file: string;
        };
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ImportApplyResponse'];
        };
      };
      /** @description Not a CSV, missing columns, or no valid row; nothing changed */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Over 1 MB; nothing changed */
      413: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  CatalogueCsvController_exportCsv: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      /** @description Columns sku,kind,name,brand,price,labour_minutes,bay_kind,stock_qty,lead_days,active,attributes */
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'text/csv': string;
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'text/csv': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'text/csv': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  FitReportsController_tyreSize: {
    parameters: {
      query: {
        /** @description A tyre size, with or without service description */
        designation: string;
      };
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['TyreSizeResponse'];
        };
      };
      /** @description fieldErrors.designation names the wrong part */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  FitReportsController_check: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CheckFitmentDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['FitReportResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  RuleSetsController_list: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['RuleSetListResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  RuleSetsController_get: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody?: never;
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['RuleSetResponse'];
        };
      };
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  RuleSetsController_update: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateRuleSetDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['RuleSetResponse'];
        };
      };
      /** @description fieldErrors "limits.<key>.value"; nothing changed */
      400: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
}
