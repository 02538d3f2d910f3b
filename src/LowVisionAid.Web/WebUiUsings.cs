// Program.cs calls these registration extensions (AddCalculationApi, UseFriendlyErrors, ...) without using lines
// of its own, so its edits from other parts of the app merge cleanly.
global using LowVisionAid.Web.Api;
global using LowVisionAid.Web.Errors;
