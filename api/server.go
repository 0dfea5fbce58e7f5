package api

import (
	"net/http"

	"github.com/labstack/echo/v4"
	"github.com/labstack/echo/v4/middleware"
	"github.com/rs/zerolog"

	"colloidtriage/advisor"
)

// Config holds what the transport needs besides the engine.
type Config struct {
	Logger    zerolog.Logger
	BodyLimit string // per-request body limit of the single-sample routes, e.g. "256K"
	OpenAPI   []byte // the OpenAPI document served at /openapi.json
	APIKeys   []string
}

// DefaultConfig is the configuration of a local, unauthenticated service.
var DefaultConfig = Config{Logger: zerolog.Nop(), BodyLimit: "256K"}

// New builds the HTTP application around an engine.
func New(engine *advisor.Engine, cfg Config) *echo.Echo {
	if cfg.BodyLimit == "" {
		cfg.BodyLimit = DefaultConfig.BodyLimit
	}
	e := echo.New()
	e.HideBanner, e.HidePort = true, true
	e.HTTPErrorHandler = errorHandler
	e.Use(middleware.RequestIDWithConfig(middleware.RequestIDConfig{TargetHeader: echo.HeaderXRequestID}))
	e.Use(accessLog(cfg.Logger))
	e.Use(recoverPanic)

	h := &handlers{engine: engine, validator: newSampleValidator(), openapi: cfg.OpenAPI}
	e.GET("/healthz", h.health)
	e.GET("/readyz", h.ready)
	e.GET("/openapi.json", h.openAPI)

	v1 := e.Group("/v1")
	limit := middleware.BodyLimit(cfg.BodyLimit)
	v1.POST("/triage", h.triage, limit)
	v1.POST("/scales", h.scales, limit)
	v1.GET("/catalog", h.catalog)
	v1.GET("/rules", h.rules)
	v1.GET("/materials", h.materials)
	return e
}

type handlers struct {
	engine    *advisor.Engine
	validator *sampleValidator
	openapi   []byte
}

func (h *handlers) health(c echo.Context) error {
	return c.JSON(http.StatusOK, map[string]string{"status": "ok"})
}

// ready reports ready once the rule set is compiled and the library loaded,
// which New's caller has done before serving.
func (h *handlers) ready(c echo.Context) error {
	return c.JSON(http.StatusOK, map[string]string{"status": "ready", "rules": h.engine.RuleSet().Hash,
		"engine": advisor.EngineVersion})
}

func (h *handlers) openAPI(c echo.Context) error {
	return c.Blob(http.StatusOK, echo.MIMEApplicationJSON, h.openapi)
}
