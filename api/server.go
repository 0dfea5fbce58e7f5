package api

import (
	"net/http"
	"time"

	"github.com/labstack/echo/v4"
	"github.com/labstack/echo/v4/middleware"
	"github.com/rs/zerolog"

	"colloidtriage/advisor"
)

// Config holds what the transport needs besides the engine.
type Config struct {
	Logger    zerolog.Logger
	BodyLimit string   // body limit of the single-sample routes in echo's notation; "256K" is 256,000 bytes
	OpenAPI   []byte   // the OpenAPI document served at /openapi.json
	APIKeys   []string // when not empty, every route but the health checks needs one of these keys
	// MaxBatches is how many batches may run at once; a batch past it is
	// refused with 503 and Retry-After. 0 means DefaultMaxBatches.
	MaxBatches int
	// Draining reports that the service is shutting down: /readyz then
	// answers 503. Nil means never.
	Draining func() bool
	// Idempotency keeps the answers to requests with an Idempotency-Key;
	// nil is a memory store of DefaultMemoryStoreConfig.
	Idempotency IdempotencyStore
	// BatchWriteWindow is how long a batch answer may go without an item
	// written before its connection is cut: each item moves the write
	// deadline on by it, so a long batch outlives the server's write
	// timeout while a client that stops reading is still cut off. 0 means
	// DefaultBatchWriteWindow.
	BatchWriteWindow time.Duration
}

// DefaultBatchWriteWindow is the default Config.BatchWriteWindow: far
// longer than one item takes, as long as a stalled reader may hold a batch.
const DefaultBatchWriteWindow = 60 * time.Second

// DefaultMaxBatches bounds the batches running at once: a batch holds up
// to 5000 samples and uses every core, so a few at once already fill the
// machine, and each holds its body and items in memory.
const DefaultMaxBatches = 4

// DefaultConfig is the configuration of a local, unauthenticated service.
var DefaultConfig = Config{Logger: zerolog.Nop(), BodyLimit: "256K"}

// New builds the HTTP application around an engine.
func New(engine *advisor.Engine, cfg Config) *echo.Echo {
	if cfg.BodyLimit == "" {
		cfg.BodyLimit = DefaultConfig.BodyLimit
	}
	if cfg.BatchWriteWindow <= 0 {
		cfg.BatchWriteWindow = DefaultBatchWriteWindow
	}
	e := echo.New()
	e.HideBanner, e.HidePort = true, true
	e.JSONSerializer = plainJSON{}
	e.HTTPErrorHandler = errorHandler
	m := newMetrics()
	e.Use(requestID)
	e.Use(accessLog(cfg.Logger))
	e.Use(m.middleware)
	e.Use(recoverPanic)

	if cfg.Draining == nil {
		cfg.Draining = func() bool { return false }
	}
	if cfg.MaxBatches <= 0 {
		cfg.MaxBatches = DefaultMaxBatches
	}
	h := &handlers{engine: engine, validator: newSampleValidator(), openapi: cfg.OpenAPI, metrics: m, log: cfg.Logger,
		draining: cfg.Draining, batches: make(chan struct{}, cfg.MaxBatches), batchWindow: cfg.BatchWriteWindow}
	e.GET("/healthz", h.health)
	e.GET("/readyz", h.ready)
	e.GET("/metrics", h.metricsText)

	// Authentication is route middleware, not group middleware: a group with
	// middleware adds catch-all routes that would turn 405s into 404s.
	auth := keyAuthWithConfig(keyAuthConfig{Keys: cfg.APIKeys})
	limit := middleware.BodyLimit(cfg.BodyLimit)
	if cfg.Idempotency == nil {
		cfg.Idempotency = NewMemoryStore(DefaultMemoryStoreConfig)
	}
	once := idempotent(cfg.Idempotency, bodyUnreadable)
	e.GET("/openapi.json", h.openAPI, auth)
	v1 := e.Group("/v1")
	v1.POST("/triage", h.triage, auth, limit, once)
	v1.POST("/triage/batch", h.batch, auth, middleware.BodyLimit(batchBodyLimit), idempotent(cfg.Idempotency, batchUnreadable))
	v1.POST("/scales", h.scales, auth, limit, once)
	v1.POST("/interaction-profile", h.interactionProfile, auth, limit, once)
	v1.POST("/compare", h.compare, auth, limit, once)
	v1.GET("/catalog", h.catalog, auth)
	v1.GET("/rules", h.rules, auth)
	v1.GET("/materials", h.materials, auth)
	pageRoutes(e)
	m.route(e.Routes())
	return e
}

type handlers struct {
	engine    *advisor.Engine
	validator *sampleValidator
	openapi   []byte
	metrics   *metrics
	log       zerolog.Logger
	draining  func() bool
	batches   chan struct{} // one token per running batch
	// batchWindow is Config.BatchWriteWindow.
	batchWindow time.Duration
}

func (h *handlers) health(c echo.Context) error {
	return c.JSON(http.StatusOK, map[string]string{"status": "ok"})
}

// ready reports ready once the rule set is compiled and the library loaded,
// which New's caller has done before serving, until the service begins to
// shut down.
func (h *handlers) ready(c echo.Context) error {
	if h.draining() {
		return c.JSON(http.StatusServiceUnavailable, map[string]string{"status": "draining"})
	}
	return c.JSON(http.StatusOK, map[string]string{"status": "ready", "rules": h.engine.RuleSet().Hash,
		"engine": advisor.EngineVersion})
}

func (h *handlers) openAPI(c echo.Context) error {
	return c.Blob(http.StatusOK, echo.MIMEApplicationJSON, h.openapi)
}
