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
  '/api/workshop': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The workshop's card: name, address, phone, e-mail, time zone */
    get: operations['WorkshopController_card'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/policies': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The pricing policy: labour rate, GST, charges, bundle discount, deposit */
    get: operations['WorkshopController_policy'];
    /** Replace the pricing policy (saved quotes keep the prices they were given) */
    put: operations['WorkshopController_updatePolicy'];
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/setup': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Calendar settings, the week’s hours, bays, closures, public holidays of the next 12 months */
    get: operations['WorkshopSetupController_read'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/calendar': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    /** Replace the time zone, holiday region, booking settings and the 7 days of hours; set the cancellation policy */
    put: operations['WorkshopSetupController_updateCalendar'];
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/bays': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Add a bay (switched on, placed last) */
    post: operations['WorkshopSetupController_createBay'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/bays/{id}': {
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
    /** Rename a bay, change its kind, move it in the order, switch it on or off */
    patch: operations['WorkshopSetupController_updateBay'];
    trace?: never;
  };
  '/api/workshop/closures': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Shut the workshop from one date to another (both included) */
    post: operations['WorkshopSetupController_createClosure'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/closures/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    post?: never;
    /** Remove a closure */
    delete: operations['WorkshopSetupController_deleteClosure'];
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/workshop/holidays/{date}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    /** Open on a public holiday anyway (usual hours), or stay shut on it (the default) */
    put: operations['WorkshopSetupController_setHoliday'];
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/preview': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Price and fit-check a package as it would be saved now (writes nothing) */
    post: operations['QuotesController_preview'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Quotes, newest first (a customer's own; every quote for the desk), at most 200 */
    get: operations['QuotesController_list'];
    put?: never;
    /** Save the package as a quote (version 1: sent when the customer saves it, a draft when the desk does) */
    post: operations['QuotesController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** One quote with every version (another customer's is 404) */
    get: operations['QuotesController_get'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/versions/{n}/pdf': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The quote version as a PDF */
    get: operations['QuotesController_pdf'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/versions/{n}/accept': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Accept the latest sent version of my quote */
    post: operations['QuotesController_accept'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/versions/{n}/decline': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Decline the latest sent version of my quote */
    post: operations['QuotesController_decline'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/versions/{n}/send': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Send a draft version to the customer */
    post: operations['QuotesController_send'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/revisions/preview': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Price and fit-check a revision of the quote (parts, quantities, labour per line, a workshop discount); writes nothing */
    post: operations['QuotesController_previewRevision'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/quotes/{id}/revisions': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Save a revision as the next version, sent to the customer with the reason (the version before is superseded); the customer is e-mailed the PDF and a link to compare and answer */
    post: operations['QuotesController_revise'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/planner/options': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The products of one kind made for the vehicle, each checked in the current package (best verdict first, then price) */
    post: operations['PlannerController_options'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/uploads': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The caller's own photos, newest first (at most 200) */
    get: operations['UploadsController_list'];
    put?: never;
    /** Upload a photo (vehicle or tyre placard): checked by its content, stored re-encoded without metadata, with a thumbnail */
    post: operations['UploadsController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/uploads/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The photo, for its owner or staff (another customer's photo is 404) */
    get: operations['UploadsController_original'];
    put?: never;
    post?: never;
    /** Remove one of my photos that is not on a quote (files removed) */
    delete: operations['UploadsController_remove'];
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/uploads/{id}/thumbnail': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** The photo's WebP thumbnail (at most 320 px), for its owner or staff */
    get: operations['UploadsController_thumbnail'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/customers': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Find customers by name or e-mail (any case), at most 50, by name */
    get: operations['CustomersController_search'];
    put?: never;
    /** Create a customer for a walk-in quote; they get an e-mail with a link to choose a password */
    post: operations['CustomersController_create'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/availability': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Start times that fit a quote version: per day, each with its bay segments (workshop zone and UTC) */
    get: operations['BookingsController_availability'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** Bookings, newest first (a customer's own; every booking for the desk) */
    get: operations['BookingsController_list'];
    put?: never;
    /** Hold a start time for a quote version (state held, until holdExpiresAt) */
    post: operations['BookingsController_hold'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    /** One booking (another customer's is 404) */
    get: operations['BookingsController_get'];
    put?: never;
    post?: never;
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/move': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Move to another start: all reservations at once or nothing (the customer while held; the desk while held, requested or confirmed) */
    post: operations['BookingsController_move'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/cancel': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Cancel (or release a hold): the bays are freed; a paid deposit is refunded as the cancellation policy allows */
    post: operations['BookingsController_cancel'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/deposit-checkout': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The payment page for a held booking's deposit (the open one again, or a new one); the hold lasts until the page expires */
    post: operations['BookingsController_depositCheckout'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/top-up-checkout': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The payment page for the difference when an accepted revision raised the deposit (requested or confirmed bookings) */
    post: operations['BookingsController_topUpCheckout'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/advance': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The desk moves a booking on: requested → confirmed, confirmed → in-progress (vehicle in), in-progress → completed */
    post: operations['BookingsController_advance'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/arrived': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Mark the vehicle as arrived (on site) on a requested or confirmed booking */
    post: operations['BookingsController_markArrived'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/bookings/{id}/move-request': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** Ask the workshop to move a requested or confirmed booking */
    post: operations['BookingsController_requestMove'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
    trace?: never;
  };
  '/api/payments/webhook': {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    get?: never;
    put?: never;
    /** The payment provider's events (server to server: no session or CSRF token; verified by the signature over the raw body, at most 300 s old). Each event id is handled once; a repeat answers 200 and changes nothing. */
    post: operations['PaymentsController_receive'];
    delete?: never;
    options?: never;
    head?: never;
    patch?: never;
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
      /**
       * @description Hub-centric rings only (required there): outer diameter, the wheel's centre-bore side, mm (0.1 mm steps)
       * @example 110.1
       */
      ringOuterMm?: number;
      /**
       * @description Hub-centric rings only (required there): inner diameter, the hub side, mm (0.1 mm steps); less than ringOuterMm
       * @example 106.1
       */
      ringInnerMm?: number;
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
    WorkshopCardResponse: {
      /** @example Kestrelmere 4x4 & Tyre */
      name: string;
      /** @example 7 Quarry Flat Road */
      addressLine: string;
      /** @example Tallowgate */
      town: string;
      /** @example 0491 570 006 */
      phone: string;
      /** @example bookings@kestrelmere.example */
      email: string;
      /**
       * @description IANA time zone of the workshop
       * @example Australia/Sydney
       */
      timeZone: string;
      /**
       * @description ISO 4217 currency code
       * @example AUD
       */
      currency: string;
    };
    /** @enum {string} */
    TaxRoundingMethod: 'per-invoice' | 'per-line';
    BundleDiscountPolicyResponse: {
      enabled: boolean;
      /**
       * @description Percent of the parts total, at most two decimals
       * @example 5
       */
      percent: number;
      /**
       * @description The package must hold a line of each of these kinds
       * @example [
       *       "suspension-kit",
       *       "wheel",
       *       "tyre"
       *     ]
       */
      requiresKinds: components['schemas']['ProductKind'][];
    };
    DepositPolicyResponse: {
      /**
       * @description Percent of the total, at most two decimals
       * @example 20
       */
      percent: number;
      /**
       * @description Integer cents: the deposit is at least this
       * @example 10000
       */
      floorCents: number;
      /**
       * @description Integer cents: the deposit is at most this
       * @example 100000
       */
      capCents: number;
      /**
       * @description Percent used when a part must be ordered in
       * @example 50
       */
      specialOrderPercent: number;
    };
    PolicyResponse: {
      /** @example 14000 */
      labourRateCentsPerHour: number;
      /** @description True: catalogue prices, the labour rate and the charges below include GST */
      pricesIncludeTax: boolean;
      /**
       * @description Percent, at most two decimals
       * @example 10
       */
      taxRatePercent: number;
      taxRoundingMethod: components['schemas']['TaxRoundingMethod'];
      /** @example 3500 */
      fittingBalancingCentsPerWheel: number;
      /** @example 650 */
      tyreDisposalCentsPerTyre: number;
      bundleDiscount: components['schemas']['BundleDiscountPolicyResponse'];
      deposit: components['schemas']['DepositPolicyResponse'];
      /**
       * @description Days a quote holds its prices
       * @example 30
       */
      quoteValidDays: number;
      /** Format: date-time */
      updatedAt: string;
    };
    BundleDiscountPolicyDto: {
      enabled: boolean;
      /** @example 5 */
      percent: number;
      requiresKinds: components['schemas']['ProductKind'][];
    };
    DepositPolicyDto: {
      /** @example 20 */
      percent: number;
      /** @example 10000 */
      floorCents: number;
      /**
       * @description Not below floorCents
       * @example 100000
       */
      capCents: number;
      /**
       * @description Not below percent
       * @example 50
       */
      specialOrderPercent: number;
    };
    UpdatePolicyDto: {
      /** @example 14000 */
      labourRateCentsPerHour: number;
      pricesIncludeTax: boolean;
      /** @example 10 */
      taxRatePercent: number;
      taxRoundingMethod: components['schemas']['TaxRoundingMethod'];
      /** @example 3500 */
      fittingBalancingCentsPerWheel: number;
      /** @example 650 */
      tyreDisposalCentsPerTyre: number;
      bundleDiscount: components['schemas']['BundleDiscountPolicyDto'];
      deposit: components['schemas']['DepositPolicyDto'];
      /** @example 30 */
      quoteValidDays: number;
    };
    OpeningHoursEntryResponse: {
      /**
       * @description ISO weekday: 1 = Monday
       * @example 1
       */
      weekday: number;
      open: boolean;
      /** @example 07:30 */
      opensAt: string | null;
      /** @example 17:00 */
      closesAt: string | null;
      /** @example 12:00 */
      breakStartsAt: string | null;
      /** @example 12:30 */
      breakEndsAt: string | null;
    };
    BayResponse: {
      /** Format: uuid */
      id: string;
      /** @example Hoist 1 */
      name: string;
      kind: components['schemas']['BayKind'];
      /**
       * @description Order on screens and in bay choice (1 first)
       * @example 1
       */
      position: number;
      /** @description False: switched off, offered for no new bookings */
      active: boolean;
    };
    ClosureResponse: {
      /** Format: uuid */
      id: string;
      /**
       * Format: date
       * @example 2027-01-04
       */
      startDate: string;
      /**
       * Format: date
       * @example 2027-01-08
       */
      endDate: string;
      /** @example Stocktake */
      reason: string;
    };
    HolidayResponse: {
      /**
       * Format: date
       * @example 2026-12-25
       */
      date: string;
      /** @example Christmas Day */
      name: string;
      /** @description True: the workshop opens on this day with its usual hours */
      opens: boolean;
      note: string | null;
    };
    HolidayRegionResponse: {
      /** @example AU-NSW */
      code: string;
      /** @example Australia, New South Wales */
      name: string;
    };
    WorkshopSetupResponse: {
      /**
       * @description IANA time zone of the workshop
       * @example Australia/Sydney
       */
      timeZone: string;
      /**
       * @description Public holidays come from this region
       * @example AU-NSW
       */
      holidayRegion: string;
      /**
       * @description Start times are offered every this many minutes
       * @example 30
       */
      slotStepMinutes: number;
      /**
       * @description How long a held time is kept for the customer
       * @example 15
       */
      holdMinutes: number;
      /**
       * @description Calendar days added after the longest lead time of special-order parts
       * @example 1
       */
      leadTimeBufferDays: number;
      /**
       * @description Bay minutes to mount, balance and fit one wheel
       * @example 15
       */
      fittingMinutesPerWheel: number;
      /**
       * @description Cancelled at least this many hours before the start: the whole deposit back
       * @example 48
       */
      fullRefundHoursBefore: number;
      /**
       * @description Cancelled later: this percentage of the deposit back (rounded down); 0: none
       * @example 0
       */
      lateCancelRefundPercent: number;
      /** @description Always 7, Monday first */
      openingHours: components['schemas']['OpeningHoursEntryResponse'][];
      /** @description By position */
      bays: components['schemas']['BayResponse'][];
      /** @description Closures not yet over (ending today or later), by start date */
      closures: components['schemas']['ClosureResponse'][];
      /** @description Public holidays of the next 12 months from the workshop's today, by date */
      holidays: components['schemas']['HolidayResponse'][];
      holidayRegions: components['schemas']['HolidayRegionResponse'][];
    };
    OpeningHoursEntryDto: {
      /**
       * @description ISO weekday: 1 = Monday
       * @example 1
       */
      weekday: number;
      open: boolean;
      /** @example 07:30 */
      opensAt?: string | null;
      /** @example 17:00 */
      closesAt?: string | null;
      /** @example 12:00 */
      breakStartsAt?: string | null;
      /** @example 12:30 */
      breakEndsAt?: string | null;
    };
    UpdateWorkshopCalendarDto: {
      /**
       * @description IANA time zone
       * @example Australia/Sydney
       */
      timeZone: string;
      /**
       * @description A code from holidayRegions
       * @example AU-NSW
       */
      holidayRegion: string;
      /**
       * @example 30
       * @enum {number}
       */
      slotStepMinutes: 10 | 15 | 20 | 30 | 60;
      /** @example 15 */
      holdMinutes: number;
      /** @example 1 */
      leadTimeBufferDays: number;
      /** @example 15 */
      fittingMinutesPerWheel: number;
      /**
       * @description Cancelled at least this many hours before the start: the whole deposit back (left out: unchanged)
       * @example 48
       */
      fullRefundHoursBefore?: number;
      /**
       * @description Cancelled later: this percentage of the deposit back, rounded down to the cent; 0: none (left out: unchanged)
       * @example 0
       */
      lateCancelRefundPercent?: number;
      openingHours: components['schemas']['OpeningHoursEntryDto'][];
    };
    CreateBayDto: {
      /**
       * @description Unique
       * @example Hoist 4
       */
      name: string;
      kind: components['schemas']['BayKind'];
    };
    UpdateBayDto: {
      /** @example Hoist 4 */
      name?: string;
      kind?: components['schemas']['BayKind'];
      /**
       * @description The place to move the bay to (1 first, at most the number of bays)
       * @example 2
       */
      position?: number;
      /** @description False: switched off (refused while it has bookings ahead) */
      active?: boolean;
    };
    CreateClosureDto: {
      /**
       * Format: date
       * @example 2027-01-04
       */
      startDate: string;
      /**
       * Format: date
       * @description Not before startDate
       * @example 2027-01-08
       */
      endDate: string;
      /** @example Stocktake */
      reason: string;
    };
    HolidayOverrideDto: {
      /** @description True: open with the usual hours; false: closed (the default) */
      opens: boolean;
      /** @description Kept while the workshop opens on the day */
      note?: string | null;
    };
    /** @enum {string} */
    VehicleUse: 'daily' | 'touring' | 'towing' | 'off-road';
    QuoteItemDto: {
      /** Format: uuid */
      productId: string;
      /** @example 4 */
      quantity: number;
    };
    QuotePackageDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /**
       * Format: uuid
       * @description The customer's own vehicle (theirs, and of this model)
       */
      customerVehicleId?: string;
      /**
       * @description Within the model's years
       * @example 2019
       */
      vehicleYear?: number;
      uses: components['schemas']['VehicleUse'][];
      /**
       * @description Permanent extra load, kg (drawers, canopy, water, tools)
       * @default 0
       */
      constantLoadKg: number;
      /** @description At most one wheel, one tyre and one suspension kit, plus components and services; each product once. Fitting, balancing and tyre disposal are charged by the policy, not sent as items. */
      items: components['schemas']['QuoteItemDto'][];
    };
    /** @enum {string} */
    PricedLineKind:
      | 'part'
      | 'service'
      | 'labour'
      | 'fitting-balancing'
      | 'tyre-disposal'
      | 'bundle-discount'
      | 'workshop-discount';
    /**
     * @description part
     * @enum {string}
     */
    PartKind: 'wheel' | 'tyre' | 'suspension-kit' | 'component';
    PricedLineResponse: {
      kind: components['schemas']['PricedLineKind'];
      /** @example Bramblerock Strata 50 mm lift kit, medium load (150–300 kg) */
      description: string;
      /**
       * @description Integer cents; negative only for the discount
       * @example 174500
       */
      amountCents: number;
      /** @description This line's GST with per-line rounding; null with per-invoice rounding */
      taxCents: number | null;
      /** @description part */
      productKind?: components['schemas']['PartKind'];
      /**
       * Format: uuid
       * @description part, service, labour
       */
      productId?: string;
      /** @description part, service, labour */
      sku?: string;
      /** @description part, service (units charged), fitting-balancing (wheels), tyre-disposal (tyres) */
      quantity?: number;
      /** @description part, service, fitting-balancing, tyre-disposal */
      unitPriceCents?: number;
      /** @description part: must be ordered in */
      specialOrder?: boolean;
      /** @description part */
      leadDays?: number;
      /** @description service: charged per wheel fitted */
      perWheel?: boolean;
      /** @description service: bay time included in its price */
      bayMinutes?: number;
      /** @description service, labour */
      bayKind?: components['schemas']['BayKind'] | null;
      /** @description labour: quantity × minutes per unit */
      labourMinutes?: number;
      /** @description labour */
      labourRateCentsPerHour?: number;
      /** @description bundle-discount */
      percent?: number;
      /** @description bundle-discount: the parts total it was taken of */
      discountedCents?: number;
    };
    PriceBreakdownResponse: {
      partsCents: number;
      servicesCents: number;
      labourCents: number;
      fittingBalancingCents: number;
      tyreDisposalCents: number;
      /** @description Zero or negative */
      bundleDiscountCents: number;
      /** @description Zero or negative: the desk's discount on a revised quote */
      workshopDiscountCents: number;
    };
    /** @enum {string} */
    DepositBasis: 'percentage' | 'floor' | 'cap' | 'total';
    DepositOutcomeResponse: {
      depositCents: number;
      /** @example 20 */
      percentApplied: number;
      /** @description The percentage of the total before the floor and cap */
      percentageCents: number;
      basis: components['schemas']['DepositBasis'];
      specialOrder: boolean;
      specialOrderSkus: string[];
    };
    PackagePriceResponse: {
      lines: components['schemas']['PricedLineResponse'][];
      breakdown: components['schemas']['PriceBreakdownResponse'];
      subtotalCents: number;
      /** @description GST: included in the total when prices include tax */
      taxCents: number;
      totalCents: number;
      totalExcludingTaxCents: number;
      pricesIncludeTax: boolean;
      /** @example 10 */
      taxRatePercent: number;
      taxRoundingMethod: components['schemas']['TaxRoundingMethod'];
      bundleDiscountApplied: boolean;
      deposit: components['schemas']['DepositOutcomeResponse'];
      depositCents: number;
      balanceDueCents: number;
      quoteValidDays: number;
      /** @description The rounding and tax method in words */
      roundingNote: string;
    };
    QuoteVehicleNameResponse: {
      /** Format: uuid */
      vehicleModelId: string;
      /** @example Vantrel Strata SR dual cab */
      name: string;
    };
    QuotePreviewResponse: {
      price: components['schemas']['PackagePriceResponse'];
      fitReport: components['schemas']['FitReportResponse'];
      /** @description max(quantity of the wheel line, quantity of the tyre line) */
      wheelsFitted: number;
      /** @description Quantity of the tyre line */
      tyresReplaced: number;
      /**
       * @description The last day the prices would hold if saved now (workshop time zone)
       * @example 2026-12-31
       */
      validUntilDate: string;
      vehicle: components['schemas']['QuoteVehicleNameResponse'];
    };
    CreateQuoteDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /**
       * Format: uuid
       * @description The customer's own vehicle (theirs, and of this model)
       */
      customerVehicleId?: string;
      /**
       * @description Within the model's years
       * @example 2019
       */
      vehicleYear?: number;
      uses: components['schemas']['VehicleUse'][];
      /**
       * @description Permanent extra load, kg (drawers, canopy, water, tools)
       * @default 0
       */
      constantLoadKg: number;
      /** @description At most one wheel, one tyre and one suspension kit, plus components and services; each product once. Fitting, balancing and tyre disposal are charged by the policy, not sent as items. */
      items: components['schemas']['QuoteItemDto'][];
      /** @description Photos the quote's customer uploaded and has not attached to a quote yet */
      photoIds?: string[];
      /**
       * Format: uuid
       * @description Desk and manager only, and required for them: the customer the walk-in quote is for
       */
      customerId?: string;
    };
    QuoteCustomerResponse: {
      /** Format: uuid */
      id: string;
      name: string;
      email: string;
    };
    QuoteCustomerVehicleResponse: {
      /** Format: uuid */
      id: string;
      nickname: string | null;
      rego: string | null;
    };
    QuoteVehicleResponse: {
      /** Format: uuid */
      vehicleModelId: string;
      /** @example Vantrel Strata SR dual cab */
      name: string;
      year: number | null;
      customerVehicle: components['schemas']['QuoteCustomerVehicleResponse'] | null;
    };
    /** @enum {string} */
    UploadKind: 'vehicle' | 'tyre-placard';
    QuotePhotoResponse: {
      /** Format: uuid */
      id: string;
      kind: components['schemas']['UploadKind'];
      widthPx: number;
      heightPx: number;
      /** @example /api/uploads/4f0c… */
      url: string;
      /** @example /api/uploads/4f0c…/thumbnail */
      thumbnailUrl: string;
    };
    /**
     * @description Effective state: a draft or sent version past validUntil reads expired
     * @enum {string}
     */
    QuoteVersionState: 'draft' | 'sent' | 'accepted' | 'superseded' | 'expired' | 'declined';
    QuoteVersionAuthorResponse: {
      name: string;
      role: components['schemas']['Role'];
    };
    QuoteLineResponse: {
      /** @example 1 */
      position: number;
      /**
       * Format: uuid
       * @description Null when the product was deleted since
       */
      productId: string | null;
      sku: string;
      name: string;
      brand: string;
      kind: components['schemas']['ProductKind'];
      quantity: number;
      /** @description Integer cents, on the policy tax basis at the time */
      unitPriceCents: number;
      labourMinutes: number;
      bayKind: components['schemas']['BayKind'] | null;
      leadDays: number;
      stockQty: number;
      perWheel: boolean;
    };
    QuoteVersionResponse: {
      /** Format: uuid */
      id: string;
      /** @example 1 */
      number: number;
      /** @description Effective state: a draft or sent version past validUntil reads expired */
      state: components['schemas']['QuoteVersionState'];
      /** Format: date-time */
      stateChangedAt: string;
      revisionReason: string | null;
      /** Format: date-time */
      createdAt: string;
      createdBy: components['schemas']['QuoteVersionAuthorResponse'];
      /**
       * @description Last day the prices hold (workshop time zone)
       * @example 2026-12-31
       */
      validUntilDate: string;
      /**
       * Format: date-time
       * @description The end of that day (UTC)
       */
      validUntil: string;
      wheelsFitted: number;
      tyresReplaced: number;
      lines: components['schemas']['QuoteLineResponse'][];
      price: components['schemas']['PackagePriceResponse'];
      fitReport: components['schemas']['FitReportResponse'];
      /** @description The latest version, sent or accepted, and not past validUntil */
      bookable: boolean;
      /** @example /api/quotes/4f0c…/versions/1/pdf */
      pdfUrl: string;
    };
    QuoteResponse: {
      /** Format: uuid */
      id: string;
      /** @example 123 */
      number: number;
      /** @example Q-000123 */
      reference: string;
      customer: components['schemas']['QuoteCustomerResponse'];
      vehicle: components['schemas']['QuoteVehicleResponse'];
      uses: components['schemas']['VehicleUse'][];
      constantLoadKg: number;
      /** Format: date-time */
      createdAt: string;
      photos: components['schemas']['QuotePhotoResponse'][];
      /** @description Oldest first */
      versions: components['schemas']['QuoteVersionResponse'][];
    };
    QuoteSummaryVersionResponse: {
      number: number;
      state: components['schemas']['QuoteVersionState'];
      totalCents: number;
      depositCents: number;
      /** @example 2026-12-31 */
      validUntilDate: string;
      /** Format: date-time */
      createdAt: string;
    };
    QuoteSummaryResponse: {
      /** Format: uuid */
      id: string;
      number: number;
      /** @example Q-000123 */
      reference: string;
      customer: components['schemas']['QuoteCustomerResponse'];
      /** @example Vantrel Strata SR dual cab */
      vehicleName: string;
      latestVersion: components['schemas']['QuoteSummaryVersionResponse'];
      versionCount: number;
      /** Format: date-time */
      createdAt: string;
    };
    QuoteListResponse: {
      /** @description Newest first, at most 200 */
      items: components['schemas']['QuoteSummaryResponse'][];
    };
    RevisionItemDto: {
      /** Format: uuid */
      productId: string;
      /** @example 4 */
      quantity: number;
      /** @description Labour minutes per unit for this revision, instead of the catalogue's (it changes the labour charged and the bay time) */
      labourMinutes?: number;
    };
    RevisionPreviewDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /**
       * Format: uuid
       * @description The customer's own vehicle (theirs, and of this model)
       */
      customerVehicleId?: string;
      /**
       * @description Within the model's years
       * @example 2019
       */
      vehicleYear?: number;
      uses: components['schemas']['VehicleUse'][];
      /**
       * @description Permanent extra load, kg (drawers, canopy, water, tools)
       * @default 0
       */
      constantLoadKg: number;
      /** @description The package's products, as when saving a quote, each with an optional labour override */
      items: components['schemas']['RevisionItemDto'][];
      /** @description Workshop discount, integer cents, not more than the package before it */
      discountCents?: number;
      reason?: string;
    };
    ReviseQuoteDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /**
       * Format: uuid
       * @description The customer's own vehicle (theirs, and of this model)
       */
      customerVehicleId?: string;
      /**
       * @description Within the model's years
       * @example 2019
       */
      vehicleYear?: number;
      uses: components['schemas']['VehicleUse'][];
      /**
       * @description Permanent extra load, kg (drawers, canopy, water, tools)
       * @default 0
       */
      constantLoadKg: number;
      /** @description The package's products, as when saving a quote, each with an optional labour override */
      items: components['schemas']['RevisionItemDto'][];
      /** @description Workshop discount, integer cents, not more than the package before it */
      discountCents?: number;
      /** @example The Trekline tyre is out of stock until March: swapped for the Ridgeback in the same size. */
      reason: string;
    };
    PlannerOptionsDto: {
      /** Format: uuid */
      vehicleModelId: string;
      /** @default 0 */
      constantLoadKg: number;
      /** @description The current selection (may be empty) */
      items: components['schemas']['QuoteItemDto'][];
      /** @description The kind to choose */
      kind: components['schemas']['ProductKind'];
    };
    PlannerOptionMetricsResponse: {
      /** @example 802.8 */
      newDiameterMm: number | null;
      /** @example 3.4 */
      diameterChangePercent: number | null;
      /**
       * @description What the speedometer reads at a true 100 km/h
       * @example 96.7
       */
      speedometerAtTrue100Kmh: number | null;
      /** @example 63.3 */
      combinedLiftMm: number;
      /** @example 20 */
      trackChangeMm: number;
    };
    PlannerOptionResponse: {
      product: components['schemas']['ProductResponse'];
      verdict: components['schemas']['FitVerdict'];
      /** @example Fits with the rest of the package. */
      summary: string;
      metrics: components['schemas']['PlannerOptionMetricsResponse'];
      /** @description Roles of the current package's suggested additions this product fills */
      suggestedBy: components['schemas']['AdditionRole'][];
    };
    PlannerOptionsResponse: {
      /** @description Best verdict first, then price */
      items: components['schemas']['PlannerOptionResponse'][];
      /** @description The current selection's suggested additions */
      suggestedAdditions: components['schemas']['SuggestedAdditionResponse'][];
    };
    /**
     * @description Read from the content
     * @enum {string}
     */
    UploadImageFormat: 'jpeg' | 'png' | 'webp';
    UploadResponse: {
      /** Format: uuid */
      id: string;
      kind: components['schemas']['UploadKind'];
      /** @description Read from the content */
      format: components['schemas']['UploadImageFormat'];
      /** @description Size of the stored (re-encoded) photo in bytes */
      bytes: number;
      widthPx: number;
      heightPx: number;
      /** @description The file name the browser sent, cleaned; for display only */
      originalName: string;
      /** Format: date-time */
      createdAt: string;
      /**
       * Format: uuid
       * @description The quote it is on (null until a quote is saved with it)
       */
      quoteId: string | null;
      /** @example /api/uploads/00000000-0000-4000-8000-000000000000 */
      url: string;
      /** @example /api/uploads/00000000-0000-4000-8000-000000000000/thumbnail */
      thumbnailUrl: string;
    };
    UploadListResponse: {
      items: components['schemas']['UploadResponse'][];
    };
    CustomerResponse: {
      /** Format: uuid */
      id: string;
      /** @example Ari Pellow */
      name: string;
      /** @example ari.pellow@tallowgate.example */
      email: string;
      /** Format: date-time */
      createdAt: string;
    };
    CustomerListResponse: {
      items: components['schemas']['CustomerResponse'][];
    };
    CreateCustomerDto: {
      /** @example Ari Pellow */
      name: string;
      /** @example customer@liftwright.example */
      email: string;
    };
    JobSegmentResponse: {
      bayKind: components['schemas']['BayKind'];
      /** @description Working minutes in a bay of this kind */
      minutes: number;
      /** @description The work done there, in line order */
      descriptions: string[];
    };
    JobPlanResponse: {
      /** @description In order; the next starts as one ends */
      segments: components['schemas']['JobSegmentResponse'][];
      totalMinutes: number;
      /** @description The longest lead time of the special-order parts (0: all on the shelf) */
      longestLeadDays: number;
      /**
       * @description Local date: no start before it
       * @example 2026-12-03
       */
      earliestStartDate: string;
    };
    PlannedSegmentResponse: {
      /** Format: uuid */
      bayId: string;
      /** @example Hoist 1 */
      bayName: string;
      bayKind: components['schemas']['BayKind'];
      /** @description Working minutes in the bay (the stay may be longer: breaks, nights) */
      minutes: number;
      /**
       * @description In the workshop's zone
       * @example 2026-12-03T07:30:00+11:00
       */
      start: string;
      /** @example 2026-12-02T20:30:00.000Z */
      startUtc: string;
      /** @example 2026-12-03T11:00:00+11:00 */
      end: string;
      /** @example 2026-12-03T00:00:00.000Z */
      endUtc: string;
    };
    StartOptionResponse: {
      /** @example 2026-12-03T07:30:00+11:00 */
      start: string;
      /** Format: date-time */
      startUtc: string;
      /** @example 07:30 */
      localTime: string;
      end: string;
      /** Format: date-time */
      endUtc: string;
      segments: components['schemas']['PlannedSegmentResponse'][];
    };
    AvailabilityDayResponse: {
      /** @example 2026-12-03 */
      date: string;
      /** @example Public holiday: Christmas Day */
      closedReason: string | null;
      starts: components['schemas']['StartOptionResponse'][];
    };
    AvailabilityResponse: {
      /** Format: uuid */
      quoteVersionId: string;
      /** @example Australia/Sydney */
      timeZone: string;
      /** @description How long a chosen time is held */
      holdMinutes: number;
      plan: components['schemas']['JobPlanResponse'];
      days: components['schemas']['AvailabilityDayResponse'][];
    };
    CreateBookingDto: {
      /** Format: uuid */
      quoteVersionId: string;
      /**
       * @description One of the offered starts
       * @example 2026-12-02T20:30:00.000Z
       */
      start: string;
    };
    /** @enum {string} */
    BookingState:
      'held' | 'requested' | 'confirmed' | 'in-progress' | 'completed' | 'cancelled' | 'expired';
    BookingSegmentResponse: {
      /** Format: uuid */
      bayId: string;
      /** @example Hoist 1 */
      bayName: string;
      bayKind: components['schemas']['BayKind'];
      /** @description Working minutes in the bay (the stay may be longer: breaks, nights) */
      minutes: number;
      /**
       * @description In the workshop's zone
       * @example 2026-12-03T07:30:00+11:00
       */
      start: string;
      /** @example 2026-12-02T20:30:00.000Z */
      startUtc: string;
      /** @example 2026-12-03T11:00:00+11:00 */
      end: string;
      /** @example 2026-12-03T00:00:00.000Z */
      endUtc: string;
      /**
       * @description The work done in this bay, in plain words
       * @example [
       *       "Fit lift kit",
       *       "Fitting and balancing, 4 wheels"
       *     ]
       */
      work: string[];
    };
    BookingQuoteSummaryResponse: {
      /** Format: uuid */
      id: string;
      /** @example Q-000123 */
      reference: string;
      /** Format: uuid */
      versionId: string;
      versionNumber: number;
      /** @description Integer cents */
      totalCents: number;
      /** @description Integer cents */
      depositCents: number;
      /** @example Oskerra Barrow GLX dual cab */
      vehicleName: string;
      /**
       * @description The package in a line: the work of every segment
       * @example Fit lift kit · Fitting and balancing, 4 wheels · Wheel alignment
       */
      packageSummary: string;
      /** @description The quote's latest version (a revision may follow the booked one) */
      latestVersionNumber: number;
      latestVersionState: components['schemas']['QuoteVersionState'];
    };
    BookingCustomerResponse: {
      /** Format: uuid */
      id: string;
      name: string;
      email: string;
    };
    NeedsMoveResponse: {
      /** @description Why the desk must move it, in plain words */
      reason: string;
      /** Format: date-time */
      since: string;
    };
    /** @enum {string} */
    BookingEventKind:
      | 'held'
      | 'deposit-paid'
      | 'requested'
      | 'confirmed'
      | 'moved'
      | 'move-requested'
      | 'arrived'
      | 'started'
      | 'completed'
      | 'cancelled'
      | 'expired'
      | 'top-up-paid'
      | 'revision-sent'
      | 'revision-declined'
      | 're-planned'
      | 'needs-move';
    BookingEventActorResponse: {
      name: string;
      role: components['schemas']['Role'];
    };
    BookingEventResponse: {
      /**
       * Format: date-time
       * @description UTC
       */
      at: string;
      kind: components['schemas']['BookingEventKind'];
      /** @description Null: the system (hold sweep) or the payment provider */
      actor: components['schemas']['BookingEventActorResponse'] | null;
      /** @example Moved from Thursday 3 December 2026, 7:30 am AEDT to … */
      detail: string;
    };
    MoveRequestResponse: {
      note: string;
      /** Format: date-time */
      requestedAt: string;
    };
    /** @enum {string} */
    PaymentKind: 'deposit' | 'top-up';
    /** @enum {string} */
    PaymentStatus: 'open' | 'paid' | 'expired' | 'failed';
    BookingPaymentResponse: {
      /** Format: uuid */
      id: string;
      kind: components['schemas']['PaymentKind'];
      status: components['schemas']['PaymentStatus'];
      /**
       * @description Integer cents
       * @example 100000
       */
      amountCents: number;
      /**
       * @description ISO 4217, lower case
       * @example aud
       */
      currency: string;
      /** Format: date-time */
      paidAt: string | null;
      /**
       * @description Integer cents given back so far
       * @example 0
       */
      refundedCents: number;
    };
    CancellationPolicyResponse: {
      /**
       * @description Cancelled at least this many hours before the start: the whole deposit back
       * @example 48
       */
      fullRefundHoursBefore: number;
      /**
       * @description Cancelled later: this percentage of the deposit back (rounded down to the cent)
       * @example 0
       */
      lateCancelRefundPercent: number;
      /**
       * @description Integer cents the customer would get back if the booking were cancelled at this moment (0 when nothing is paid or it cannot be cancelled)
       * @example 100000
       */
      refundIfCancelledNowCents: number;
    };
    BookingResponse: {
      /** Format: uuid */
      id: string;
      /** @example B-000042 */
      reference: string;
      state: components['schemas']['BookingState'];
      /** Format: date-time */
      holdExpiresAt: string | null;
      /** @example 2026-12-03T07:30:00+11:00 */
      start: string;
      /** Format: date-time */
      startUtc: string;
      end: string;
      /** Format: date-time */
      endUtc: string;
      /** @example Australia/Sydney */
      timeZone: string;
      segments: components['schemas']['BookingSegmentResponse'][];
      quote: components['schemas']['BookingQuoteSummaryResponse'];
      customer: components['schemas']['BookingCustomerResponse'];
      /**
       * @description The customer's vehicle on the quote
       * @example ABC123
       */
      rego: string | null;
      /** @description Set when an accepted revision no longer fits the booked time; cleared by a successful move */
      needsMove: components['schemas']['NeedsMoveResponse'] | null;
      /** @description The audit trail, oldest first */
      events: components['schemas']['BookingEventResponse'][];
      moveRequest: components['schemas']['MoveRequestResponse'] | null;
      /** @description When the desk marked the vehicle as arrived (UTC); null until then */
      arrivedAt: string | null;
      /** @description Checkout sessions of the booking, oldest first (open, paid, expired, failed) */
      payments: components['schemas']['BookingPaymentResponse'][];
      /**
       * @description Integer cents: the quote version's deposit
       * @example 100000
       */
      depositDueCents: number;
      /**
       * @description Integer cents: deposit payments received, top-ups included
       * @example 0
       */
      depositPaidCents: number;
      /**
       * @description Integer cents a top-up checkout would charge now: the version's deposit minus what the deposit and top-ups paid and still hold; 0 when none is due or the state does not allow one
       * @example 0
       */
      depositTopUpCents: number;
      /**
       * @description Integer cents: given back, all payments together
       * @example 0
       */
      refundedCents: number;
      /**
       * @description Integer cents still to pay: the total minus (paid minus refunded); 0 for a cancelled or expired booking
       * @example 412345
       */
      balanceDueCents: number;
      cancellationPolicy: components['schemas']['CancellationPolicyResponse'];
      /** Format: date-time */
      createdAt: string;
    };
    BookingConflictResponse: {
      statusCode: number;
      message: string;
      /** @description Up to 5 later starts that fit */
      nextStarts: components['schemas']['StartOptionResponse'][];
    };
    BookingListResponse: {
      items: components['schemas']['BookingResponse'][];
    };
    MoveBookingDto: {
      /** @example 2026-12-02T20:30:00.000Z */
      start: string;
    };
    DepositCheckoutResponse: {
      /**
       * @description The payment provider's hosted page for this booking's deposit
       * @example https://pay.example/pay/cs_test_…
       */
      checkoutUrl: string;
      /**
       * Format: date-time
       * @description The page stops taking payment then
       */
      expiresAt: string;
      booking: components['schemas']['BookingResponse'];
    };
    /** @enum {string} */
    DeskBookingStep: 'confirmed' | 'in-progress' | 'completed';
    AdvanceBookingDto: {
      state: components['schemas']['DeskBookingStep'];
    };
    MoveRequestDto: {
      /** @example Could it be the Thursday after? */
      note: string;
    };
    WebhookReceivedResponse: {
      /** @example true */
      received: boolean;
      /**
       * @description True: this event had been handled before; nothing changed
       * @example false
       */
      duplicate: boolean;
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
  WorkshopController_card: {
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
          'application/json': components['schemas']['WorkshopCardResponse'];
        };
      };
    };
  };
  WorkshopController_policy: {
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
          'application/json': components['schemas']['PolicyResponse'];
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
  WorkshopController_updatePolicy: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdatePolicyDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['PolicyResponse'];
        };
      };
      /** @description fieldErrors such as "deposit.capCents"; nothing changed */
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
  WorkshopSetupController_read: {
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
          'application/json': components['schemas']['WorkshopSetupResponse'];
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
  WorkshopSetupController_updateCalendar: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['UpdateWorkshopCalendarDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['WorkshopSetupResponse'];
        };
      };
      /** @description fieldErrors keyed like the body (e.g. "openingHours[2].closesAt"); nothing changed */
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
  WorkshopSetupController_createBay: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateBayDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['WorkshopSetupResponse'];
        };
      };
      /** @description Invalid fields or a name already taken */
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
  WorkshopSetupController_updateBay: {
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
        'application/json': components['schemas']['UpdateBayDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['WorkshopSetupResponse'];
        };
      };
      /** @description Invalid fields or a name already taken */
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
      /** @description Switching off, or changing the kind of, a bay with bookings ahead */
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
  WorkshopSetupController_createClosure: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateClosureDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['WorkshopSetupResponse'];
        };
      };
      /** @description fieldErrors keyed like the body (e.g. "openingHours[2].closesAt"); nothing changed */
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
  WorkshopSetupController_deleteClosure: {
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
          'application/json': components['schemas']['WorkshopSetupResponse'];
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
  WorkshopSetupController_setHoliday: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        date: string;
      };
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['HolidayOverrideDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['WorkshopSetupResponse'];
        };
      };
      /** @description fieldErrors.date when the date is no public holiday of the region */
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
  QuotesController_preview: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['QuotePackageDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['QuotePreviewResponse'];
        };
      };
      /** @description fieldErrors such as "items[2].productId" */
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
  QuotesController_list: {
    parameters: {
      query?: {
        /** @description Desk and manager: one customer's quotes */
        customerId?: string;
        /** @description Quote number (123 or Q-000123), customer name or e-mail, or rego */
        q?: string;
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
          'application/json': components['schemas']['QuoteListResponse'];
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
  QuotesController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateQuoteDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['QuoteResponse'];
        };
      };
      /** @description fieldErrors; a package that does not fit is refused with fieldErrors.items */
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
  QuotesController_get: {
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
          'application/json': components['schemas']['QuoteResponse'];
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
  QuotesController_pdf: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
        /** @description Version number */
        n: number;
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
          'application/pdf': string;
        };
      };
      /** @description Not signed in */
      401: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/pdf': components['schemas']['ErrorResponse'];
        };
      };
      /** @description Role not allowed */
      403: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/pdf': components['schemas']['ErrorResponse'];
        };
      };
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/pdf': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  QuotesController_accept: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
        /** @description Version number */
        n: number;
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
          'application/json': components['schemas']['QuoteResponse'];
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
      /** @description Expired, superseded, declined, already accepted or not the latest */
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
  QuotesController_decline: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
        /** @description Version number */
        n: number;
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
          'application/json': components['schemas']['QuoteResponse'];
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
  QuotesController_send: {
    parameters: {
      query?: never;
      header?: never;
      path: {
        id: string;
        /** @description Version number */
        n: number;
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
          'application/json': components['schemas']['QuoteResponse'];
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
      /** @description Not a draft, expired or not the latest */
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
  QuotesController_previewRevision: {
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
        'application/json': components['schemas']['RevisionPreviewDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['QuotePreviewResponse'];
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
  QuotesController_revise: {
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
        'application/json': components['schemas']['ReviseQuoteDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['QuoteResponse'];
        };
      };
      /** @description fieldErrors; a package that does not fit is refused with fieldErrors.items */
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
  PlannerController_options: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['PlannerOptionsDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['PlannerOptionsResponse'];
        };
      };
      /** @description fieldErrors such as "items[2].productId" */
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
  UploadsController_list: {
    parameters: {
      query?: {
        /** @description Only the photos on this quote */
        quoteId?: string;
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
          'application/json': components['schemas']['UploadListResponse'];
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
  UploadsController_create: {
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
           * @description A JPEG, PNG or WebP photo, at most 10 MB and 40 megapixels
           */
          photo: string;
          /** @enum {string} */
          kind: 'vehicle' | 'tyre-placard';
        };
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['UploadResponse'];
        };
      };
      /** @description No photo, not a JPEG/PNG/WebP image by content, too many pixels, a bad kind, or 20 photos already waiting for a quote */
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
      /** @description Over 10 MB; nothing stored */
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
  UploadsController_original: {
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
      /** @description The stored photo in its own format */
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'image/jpeg': string;
          'image/png': string;
          'image/webp': string;
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
  UploadsController_remove: {
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
      /** @description Removed */
      204: {
        headers: {
          [name: string]: unknown;
        };
        content?: never;
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
      /** @description Not one of my photos */
      404: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description The photo is on a saved quote */
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
  UploadsController_thumbnail: {
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
      /** @description WebP thumbnail */
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'image/webp': string;
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
  CustomersController_search: {
    parameters: {
      query?: {
        /** @description Words each found in the name or e-mail address (any case); without it, the first customers by name */
        q?: string;
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
          'application/json': components['schemas']['CustomerListResponse'];
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
  CustomersController_create: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateCustomerDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['CustomerResponse'];
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
  BookingsController_availability: {
    parameters: {
      query: {
        quoteVersionId: string;
        /** @description Default: the workshop's today */
        from?: string;
        days?: number;
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
          'application/json': components['schemas']['AvailabilityResponse'];
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
      /** @description The version cannot be booked (expired, replaced…) */
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
  BookingsController_list: {
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
          'application/json': components['schemas']['BookingListResponse'];
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
  BookingsController_hold: {
    parameters: {
      query?: never;
      header?: never;
      path?: never;
      cookie?: never;
    };
    requestBody: {
      content: {
        'application/json': components['schemas']['CreateBookingDto'];
      };
    };
    responses: {
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingResponse'];
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
      /** @description Taken or not offered: nextStarts */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingConflictResponse'];
        };
      };
    };
  };
  BookingsController_get: {
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
          'application/json': components['schemas']['BookingResponse'];
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
  BookingsController_move: {
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
        'application/json': components['schemas']['MoveBookingDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingResponse'];
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
      /** @description Taken or not offered: nextStarts */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingConflictResponse'];
        };
      };
    };
  };
  BookingsController_cancel: {
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
          'application/json': components['schemas']['BookingResponse'];
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
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description The refund could not be made: nothing changed */
      502: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  BookingsController_depositCheckout: {
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
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['DepositCheckoutResponse'];
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
      /** @description Not held, the hold has run out, or the deposit is already paid */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description The payment provider cannot be reached: nothing changed */
      502: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  BookingsController_topUpCheckout: {
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
      201: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['DepositCheckoutResponse'];
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
      /** @description Nothing is due, or the booking is not requested or confirmed */
      409: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
      /** @description The payment provider cannot be reached: nothing changed */
      502: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['ErrorResponse'];
        };
      };
    };
  };
  BookingsController_advance: {
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
        'application/json': components['schemas']['AdvanceBookingDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingResponse'];
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
      /** @description Not the state this step starts from */
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
  BookingsController_markArrived: {
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
          'application/json': components['schemas']['BookingResponse'];
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
      /** @description Already marked in, or not requested or confirmed */
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
  BookingsController_requestMove: {
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
        'application/json': components['schemas']['MoveRequestDto'];
      };
    };
    responses: {
      200: {
        headers: {
          [name: string]: unknown;
        };
        content: {
          'application/json': components['schemas']['BookingResponse'];
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
  PaymentsController_receive: {
    parameters: {
      query?: never;
      header: {
        /** @description t=<unix time>,v1=<HMAC> */
        'stripe-signature': string;
      };
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
          'application/json': components['schemas']['WebhookReceivedResponse'];
        };
      };
      /** @description Missing, stale or non-matching signature: nothing recorded */
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
}
