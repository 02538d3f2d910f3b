using FluentValidation;
using LowVisionAid.Web.Pages.Calculator;
using LowVisionAid.Web.Pages.Admin;
using LowVisionAid.Web.Pages.Clients;
using LowVisionAid.Web.Pages.FollowUps;
using LowVisionAid.Web.Pages.Kit;
using LowVisionAid.Web.Plans;
using LowVisionAid.Web.Pages.Settings;
using LowVisionAid.Web.Pages.Trials;
using LowVisionAid.Web.Pages.Visits;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>The clinic-flow pages, their validators and their handlers.</summary>
internal static class ClinicPagesSetup
{
    public static WebApplicationBuilder AddClinicPages(this WebApplicationBuilder builder)
    {
        builder.Services.AddRazorPages()
            .AddMvcOptions(o => o.SuppressImplicitRequiredAttributeForNonNullableReferenceTypes = true);
        builder.Services.AddValidatorsFromAssemblyContaining<Program>(ServiceLifetime.Singleton, includeInternalTypes: true);
        builder.Services.AddClinicHandlers();
        return builder;
    }

    /// <summary>
    /// Each use case's handler, once, by feature: plain classes injected into the page (or endpoint) that needs them.
    /// A new handler is added here; <c>HandlerRegistrationTests</c> fails on one that is missing or listed twice.
    /// </summary>
    public static IServiceCollection AddClinicHandlers(this IServiceCollection services)
    {
        // Quick calculator: stateless, shared by the page and the JSON API.
        services.AddSingleton<QuickPlanHandler>();

        // Clients
        services.AddScoped<ClientListHandler>();
        services.AddScoped<NewClientHandler>();
        services.AddScoped<EditClientHandler>();
        services.AddScoped<ClientDetailsHandler>();
        services.AddScoped<ClientExportHandler>();
        services.AddScoped<ClientEraseHandler>();

        // Visits
        services.AddScoped<VisitFormHandler>();
        services.AddScoped<NewVisitHandler>();
        services.AddScoped<EditVisitHandler>();
        services.AddScoped<VisitDetailsHandler>();

        // Plans
        services.AddScoped<MakePlanHandler>();
        services.AddScoped<ChoosePlanOptionHandler>();
        services.AddScoped<PlanDetailsHandler>();

        // Trials and follow-ups
        services.AddScoped<NewTrialHandler>();
        services.AddScoped<FollowUpListHandler>();
        services.AddScoped<FollowUpDoneHandler>();

        // Kit and settings
        services.AddScoped<KitHandler>();
        services.AddScoped<SettingsHandler>();

        // Administration: accounts, backup and restore
        services.AddScoped<NewAccountHandler>();
        services.AddScoped<TakeBackupHandler>();
        services.AddScoped<RestoreBackupHandler>();
        return services;
    }
}
