using LowVisionAid.Web.Tests.Support;
using Microsoft.AspNetCore.Authorization;
using Microsoft.AspNetCore.Hosting;
using Microsoft.Extensions.DependencyInjection;

namespace LowVisionAid.Web.Tests.Infrastructure;

/// <summary>
/// Handlers are listed by feature (ClinicPagesSetup), not found by a name suffix: every use-case handler is registered
/// exactly once, as itself, and the authorization handler only as what it is.
/// </summary>
public sealed class HandlerRegistrationTests
{
    [Fact]
    [Trait("Category", "Slow")]
    public void Every_use_case_handler_is_registered_once_and_the_authorization_handler_only_as_one()
    {
        IReadOnlyList<ServiceDescriptor> registered = [];
        using var app = new ClinicApp();
        using var captured = app.WithWebHostBuilder(b => b.ConfigureServices(services => registered = [.. services]));
        _ = captured.Services;   // builds the host, so the list above is the app's whole registration

        var handlers = typeof(Program).Assembly.GetTypes()
            .Where(t => t is { IsClass: true, IsAbstract: false } && t.Name.EndsWith("Handler", StringComparison.Ordinal))
            .Where(t => !typeof(IAuthorizationHandler).IsAssignableFrom(t))
            .ToList();
        Assert.NotEmpty(handlers);
        foreach (var handler in handlers)
        {
            var count = registered.Count(d => d.ServiceType == handler);
            Assert.True(count == 1, $"{handler.Name} is registered {count} times; list it once in ClinicPagesSetup.AddClinicHandlers.");
        }

        var authorization = typeof(Program).Assembly.GetTypes().Where(t => t.IsClass && !t.IsAbstract && typeof(IAuthorizationHandler).IsAssignableFrom(t)).ToList();
        Assert.NotEmpty(authorization);
        Assert.All(authorization, t => Assert.DoesNotContain(registered, d => d.ServiceType == t));
    }
}
