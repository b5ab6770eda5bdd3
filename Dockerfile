# Decide in a container: build with the SDK image, run on the smaller ASP.NET image as a non-root user.
# The SQLite default keeps its data in the /data volume; for several instances set Database__Provider=Postgres and
# ConnectionStrings__Decide (see deploy/compose.yaml and deploy/operations.md).

FROM mcr.microsoft.com/dotnet/sdk:10.0 AS build
WORKDIR /src
COPY . .
RUN dotnet publish src/Decide.Web/Decide.Web.csproj -c Release -o /app --nologo

FROM mcr.microsoft.com/dotnet/aspnet:10.0 AS runtime
WORKDIR /app
COPY --from=build /app .
COPY deploy/healthcheck.sh /usr/local/bin/decide-healthcheck
ENV ASPNETCORE_HTTP_PORTS=8080 \
    ASPNETCORE_ENVIRONMENT=Production \
    Database__DataFolder=/data \
    Logging__Format=json
RUN mkdir -p /data && chown "$APP_UID" /data && chmod 755 /usr/local/bin/decide-healthcheck
VOLUME ["/data"]
USER $APP_UID
EXPOSE 8080
HEALTHCHECK --interval=30s --timeout=5s --start-period=30s --retries=3 CMD ["/usr/local/bin/decide-healthcheck"]
ENTRYPOINT ["dotnet", "Decide.Web.dll"]
