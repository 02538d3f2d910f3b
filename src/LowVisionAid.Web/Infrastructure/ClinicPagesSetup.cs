using FluentValidation;

namespace LowVisionAid.Web.Infrastructure;

/// <summary>The clinic-flow pages, their validators and their handlers.</summary>
internal static class ClinicPagesSetup
{
    public static WebApplicationBuilder AddClinicPages(this WebApplicationBuilder builder)
    {
        builder.Services.AddRazorPages()
            .AddMvcOptions(o => o.SuppressImplicitRequiredAttributeForNonNullableReferenceTypes = true);
        builder.Services.AddValidatorsFromAssemblyContaining<Program>(ServiceLifetime.Singleton, includeInternalTypes: true);
        builder.Services.AddHandlers();
        return builder;
    }

    // Handlers are plain classes, one per use case, injected into the page that needs them.
    private static void AddHandlers(this IServiceCollection services)
    {
        foreach (var type in typeof(Program).Assembly.GetTypes()
                     .Where(t => t is { IsClass: true, IsAbstract: false } && t.Name.EndsWith("Handler", StringComparison.Ordinal)))
        {
            services.AddScoped(type);
        }
    }
}
