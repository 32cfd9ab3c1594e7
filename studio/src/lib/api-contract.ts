/* Generated from api/openapi.json by `npm run contract` (openapi-typescript). Do not edit: change the API and regenerate. */
export interface paths {
    "/api/health": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["HealthController_check"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/me": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AuthController_me"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/register": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_register"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/login": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_login"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/logout": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_logout"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/verify-email": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_verifyEmail"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/verify-email/resend": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_resendVerification"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password/forgot": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_forgotPassword"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password/reset": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_resetPassword"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/password/change": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_changePassword"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/email/change": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_changeEmail"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/auth/email/confirm": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AuthController_confirmEmail"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/users/me": {
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
        patch: operations["UsersController_updateProfile"];
        trace?: never;
    };
    "/api/workshops": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["WorkshopsController_listMine"];
        put?: never;
        post: operations["WorkshopsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["WorkshopsController_get"];
        put?: never;
        post?: never;
        delete: operations["WorkshopsController_remove"];
        options?: never;
        head?: never;
        patch: operations["WorkshopsController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/logo": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put: operations["WorkshopsController_setLogo"];
        post?: never;
        delete: operations["WorkshopsController_removeLogo"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/members": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MembersController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/members/{userId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["MembersController_remove"];
        options?: never;
        head?: never;
        patch: operations["MembersController_changeRole"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/transfer-ownership": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["MembersController_transfer"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/leave": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["MembersController_leave"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/invitations": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["WorkshopInvitationsController_list"];
        put?: never;
        post: operations["WorkshopInvitationsController_invite"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/invitations/{invitationId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["WorkshopInvitationsController_revoke"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/invitations/lookup": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["InvitationsController_preview"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/invitations/accept": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["InvitationsController_accept"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/invitations/opt-out": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["InvitationsController_optOut"];
        put: operations["InvitationsController_setOptOut"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/users": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AdminController_listUsers"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/users/{userId}/disable": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AdminController_disableUser"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/users/{userId}/enable": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AdminController_enableUser"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/workshops": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AdminController_listWorkshops"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/workshops/{workshopId}/disable": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AdminController_disableWorkshop"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/admin/workshops/{workshopId}/enable": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AdminController_enableWorkshop"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/tools/fits": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["ToolsController_fits"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/tools/splines": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Basic dimensions of an involute spline (ANSI B92.1 inch, ISO 4156 / ANSI B92.2M metric) */
        get: operations["ToolsController_splines"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/tools/splines/identify": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Candidate spline designations for a tooth count and a measured major or minor diameter */
        get: operations["ToolsController_identifySpline"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/tools/measurements/extract": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["ToolsController_extractMeasurements"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/tools/transcripts/parse": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["ToolsController_parseTranscript"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["BuildsController_list"];
        put?: never;
        post: operations["BuildsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["BuildsController_get"];
        put?: never;
        post?: never;
        delete: operations["BuildsController_remove"];
        options?: never;
        head?: never;
        patch: operations["BuildsController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/deletion-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["DeletionImpactController_build"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/deletion-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["DeletionImpactController_assembly"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/deletion-impact": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["DeletionImpactController_footage"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PartsController_list"];
        put?: never;
        post: operations["PartsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts/{partId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PartsController_get"];
        put?: never;
        post?: never;
        delete: operations["PartsController_remove"];
        options?: never;
        head?: never;
        patch: operations["PartsController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts/{partId}/photos": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["PartsController_addPhoto"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts/{partId}/photos/{photoId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PartsController_photo"];
        put?: never;
        post?: never;
        delete: operations["PartsController_removePhoto"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts/{partId}/features": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["PartsController_addFeature"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/parts/{partId}/features/{featureId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["PartsController_removeFeature"];
        options?: never;
        head?: never;
        patch: operations["PartsController_updateFeature"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/measurements": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MeasurementsController_list"];
        put?: never;
        post: operations["MeasurementsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/measurements/{measurementId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["MeasurementsController_remove"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/checklist": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitChecksController_checklist"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/checks": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitChecksController_createManual"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/transitions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitChecksController_transition"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/evidence": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitChecksController_addEvidence"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/photos": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitChecksController_addPhotoEvidence"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/evidence/{evidenceId}/photo": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitChecksController_evidencePhoto"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/history": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitChecksController_history"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/interfaces/{interfaceId}/what-if": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitChecksController_whatIf"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/assemblies": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AssembliesController_list"];
        put?: never;
        post: operations["AssembliesController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["AssembliesController_detail"];
        put?: never;
        post?: never;
        delete: operations["AssembliesController_remove"];
        options?: never;
        head?: never;
        patch: operations["AssembliesController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/parts/{partId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put: operations["AssembliesController_placePart"];
        post?: never;
        delete: operations["AssembliesController_removePart"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/interfaces": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["AssembliesController_addInterface"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/assemblies/{assemblyId}/interfaces/{interfaceId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["AssembliesController_removeInterface"];
        options?: never;
        head?: never;
        patch: operations["AssembliesController_updateInterface"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage-limits": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageController_limits"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/footage": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageController_list"];
        put?: never;
        post: operations["FootageController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageController_get"];
        put?: never;
        post?: never;
        delete: operations["FootageController_remove"];
        options?: never;
        head?: never;
        patch: operations["FootageController_rename"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/playback": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageController_playback"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/upload": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageController_uploadState"];
        put?: never;
        post?: never;
        delete: operations["FootageController_abort"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/upload/part-urls": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FootageController_signPartUrls"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/upload/parts/{partNumber}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put: operations["FootageController_recordPart"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/upload/complete": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FootageController_complete"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/hls/master.m3u8": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageMediaController_master"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/hls/{variant}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageMediaController_variant"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/thumbnails.vtt": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageMediaController_thumbnails"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/waveform": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageMediaController_waveform"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/renditions/retry": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FootageMediaController_retry"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/media-settings": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FootageMediaController_settings"];
        put: operations["FootageMediaController_updateSettings"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_read"];
        put: operations["TranscriptsController_attach"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript/file": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["TranscriptsController_attachFile"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript/revisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_revisions"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript/webvtt": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_exportWebVtt"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript/search": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_searchFootage"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/transcript/search/moments": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_hitMoments"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/transcripts/search": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["TranscriptsController_searchWorkshop"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/marks": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MarksController_list"];
        put?: never;
        post: operations["MarksController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/marks/{markId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["MarksController_remove"];
        options?: never;
        head?: never;
        patch: operations["MarksController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/mark-suggestions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["MarksController_suggestions"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/mark-suggestions/{suggestionId}/accept": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["MarksController_accept"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/footage/{footageId}/mark-suggestions/{suggestionId}/dismiss": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["MarksController_dismiss"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/guides": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuidesController_list"];
        put?: never;
        post: operations["GuidesController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/guide-steps": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuidesController_stepChoices"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuidesController_get"];
        put?: never;
        post?: never;
        delete: operations["GuidesController_remove"];
        options?: never;
        head?: never;
        patch: operations["GuidesController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}/steps": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["GuidesController_addStep"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}/steps/order": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put: operations["GuidesController_reorderSteps"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}/steps/{stepId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["GuidesController_removeStep"];
        options?: never;
        head?: never;
        patch: operations["GuidesController_updateStep"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}/revisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuidesController_revisions"];
        put?: never;
        post: operations["GuidesController_publish"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/guides/{guideId}/publication": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["GuidesController_withdraw"];
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_index"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_read"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/video": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_video"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/poster": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_poster"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/evidence/{evidenceId}/photo": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_evidencePhoto"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/captions.vtt": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_captions"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/hls/master.m3u8": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_hlsMaster"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/hls/{variant}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_hlsVariant"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/thumbnails.vtt": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_thumbnails"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/waveform": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedGuidesController_waveform"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/cues": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["PublishedTranscriptController_cues"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/revisions": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuideRevisionsController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/revisions/compare": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuideRevisionsController_compare"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/revisions/{number}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuideRevisionsController_revision"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/reading": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["GuideRevisionsController_reading"];
        put: operations["GuideRevisionsController_recordReading"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/follows": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FollowsController_list"];
        put?: never;
        post: operations["FollowsController_follow"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/follows/unsubscribe": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FollowsController_unsubscribe"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/follows/preferences": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FollowsController_getPreferences"];
        put: operations["FollowsController_updatePreferences"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/follows/preferences/link": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FollowsController_getPreferencesByLink"];
        put: operations["FollowsController_updatePreferencesByLink"];
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/follows/{followId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post?: never;
        delete: operations["FollowsController_unfollow"];
        options?: never;
        head?: never;
        patch: operations["FollowsController_setDelivery"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/fit-news": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitNewsRecordController_forCheck"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/checks/{checkId}/fit-news/retry": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitNewsRecordController_retry"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/fit-news": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["BuildFitNewsRecordController_forBuild"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/builds/{buildId}/fit-news/retry": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["BuildFitNewsRecordController_retry"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/guides/{workshopSlug}/{guideSlug}/fit-reports": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitReportsController_create"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/fit-reports": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitReportsController_mine"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/fit-reports/{reportId}/photos": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get?: never;
        put?: never;
        post: operations["FitReportsController_addPhoto"];
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/fit-reports/{reportId}/photos/{photoId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["FitReportsController_photo"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/fit-reports": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["WorkshopFitReportsController_list"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/workshops/{workshopId}/fit-reports/{reportId}": {
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
        patch: operations["WorkshopFitReportsController_update"];
        trace?: never;
    };
    "/api/workshops/{workshopId}/fit-reports/{reportId}/photos/{photoId}": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        get: operations["WorkshopFitReportsController_photo"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/fit-finder": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Published assemblies whose checks match what you have, confirmed first; near misses apart with the reason */
        get: operations["FitFinderController_find"];
        put?: never;
        post?: never;
        delete?: never;
        options?: never;
        head?: never;
        patch?: never;
        trace?: never;
    };
    "/api/search": {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        /** Search published guides (titles, steps, parts, part numbers, transcript cues) and, signed in, your workshops */
        get: operations["SearchController_search"];
        put?: never;
        post?: never;
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
        HealthChecksDto: {
            /** @enum {string} */
            database: "up" | "down";
            /** @enum {string} */
            storage: "up" | "down";
            /** @enum {string} */
            mail: "up" | "down";
            /** @enum {string} */
            queue: "up" | "down";
        };
        HealthReportDto: {
            /** @example 503 */
            statusCode?: number;
            /** @example Down: mail */
            message?: string;
            /** @enum {string} */
            status: "ok" | "down";
            checks: components["schemas"]["HealthChecksDto"];
        };
        SessionUserDto: {
            /** Format: uuid */
            id: string;
            /** @example rowan@harrow-lane.example */
            email: string;
            /** @example Rowan Avery */
            displayName: string;
            isAdmin: boolean;
            /** @enum {string} */
            preferredUnits: "metric" | "inch";
            emailVerified: boolean;
        };
        MeResponseDto: {
            /** @description null when signed out */
            user: components["schemas"]["SessionUserDto"] | null;
        };
        RegisterDto: {
            /** @example rowan@harrow-lane.example */
            email: string;
            password: string;
            /** @example Rowan Avery */
            displayName: string;
        };
        MessageDto: {
            /** @example Check your inbox for a link to confirm your e-mail address. */
            message: string;
        };
        LoginDto: {
            /** @example rowan@harrow-lane.example */
            email: string;
            password: string;
        };
        EmailTokenDto: {
            /** @description The token from the e-mailed link */
            token: string;
        };
        ForgotPasswordDto: {
            /** @example rowan@harrow-lane.example */
            email: string;
        };
        ResetPasswordDto: {
            /** @description The token from the e-mailed link */
            token: string;
            password: string;
        };
        ChangePasswordDto: {
            currentPassword: string;
            newPassword: string;
        };
        ChangeEmailDto: {
            /** @example rowan.avery@harrow-lane.example */
            newEmail: string;
            /** @description The current password, to confirm it is you */
            password: string;
        };
        UpdateProfileDto: {
            /** @example Rowan Avery */
            displayName?: string;
            /**
             * @description How lengths are shown: millimetres or inches
             * @enum {string}
             */
            preferredUnits?: "metric" | "inch";
        };
        CreateWorkshopDto: {
            /** @example Harrow Lane Garage */
            name: string;
            /**
             * @description The workshop in web addresses
             * @example harrow-lane-garage
             */
            slug: string;
            /** @example Electric conversions of compact pickups */
            description?: string;
        };
        WorkshopView: {
            /** Format: uuid */
            id: string;
            /** @example harrow-lane-garage */
            slug: string;
            /** @example Harrow Lane Garage */
            name: string;
            description: string;
            /** @description A time-limited link to the logo image */
            logoUrl: string | null;
            /** @description Disabled by a site admin: readable, not changeable */
            disabled: boolean;
            /** @description Members’ names may appear on public pages (who confirmed a fit) */
            showMemberNames: boolean;
            /**
             * @description The caller's role
             * @enum {string|null}
             */
            role: "owner" | "editor" | "admin" | null;
            createdAt: string;
        };
        UpdateWorkshopDto: {
            name?: string;
            /** @description Changing it changes the workshop’s web addresses */
            slug?: string;
            description?: string;
            /** @description Show members’ names on public pages (who confirmed a fit); off by default */
            showMemberNames?: boolean;
        };
        DeleteWorkshopDto: {
            /** @description The workshop’s name, typed again: deleting cannot be undone */
            confirmName: string;
        };
        MemberView: {
            /** Format: uuid */
            userId: string;
            displayName: string;
            email: string;
            /** @enum {string} */
            role: "owner" | "editor";
            joinedAt: string;
        };
        ChangeRoleDto: {
            /** @enum {string} */
            role: "owner" | "editor";
        };
        TransferOwnershipDto: {
            /**
             * Format: uuid
             * @description The member who becomes owner; you become an editor
             */
            userId: string;
        };
        InvitationView: {
            /** Format: uuid */
            id: string;
            email: string;
            /** @enum {string} */
            role: "owner" | "editor";
            expiresAt: string;
            expired: boolean;
            invitedBy: string | null;
            createdAt: string;
        };
        CreateInvitationDto: {
            /** @example sam@harrow-lane.example */
            email: string;
            /**
             * @example editor
             * @enum {string}
             */
            role: "owner" | "editor";
        };
        InvitationPreview: {
            workshop: Record<string, never>;
            email: string;
            /** @enum {string} */
            role: "owner" | "editor";
            invitedBy: string | null;
            expiresAt: string;
            /** @enum {string} */
            status: "pending" | "accepted" | "expired";
        };
        InvitationTokenDto: {
            /** @description The token from the invitation link */
            token: string;
        };
        AcceptedInvitation: {
            /** Format: uuid */
            workshopId: string;
            /** @enum {string} */
            role: "owner" | "editor";
        };
        InvitationOptOutView: {
            /** @description The address the link was sent to */
            email: string;
            /** @description Invitations to this address are refused */
            stopped: boolean;
            /** @description Since when (ISO 8601), when stopped */
            stoppedSince: string | null;
        };
        InvitationOptOutChangeDto: {
            /** @description true: no more invitations to this address; false: invitations allowed again */
            stopped: boolean;
        };
        AdminUserDto: {
            /** Format: uuid */
            id: string;
            /** @example rowan@harrow-lane.example */
            email: string;
            /** @example Rowan Avery */
            displayName: string;
            isAdmin: boolean;
            /** @enum {string} */
            preferredUnits: "metric" | "inch";
            emailVerified: boolean;
            disabled: boolean;
            createdAt: string;
        };
        AdminUserPageDto: {
            items: components["schemas"]["AdminUserDto"][];
            total: number;
            page: number;
            pageSize: number;
        };
        AdminWorkshopView: {
            /** Format: uuid */
            id: string;
            slug: string;
            name: string;
            disabled: boolean;
            memberCount: number;
            owners: string[];
            createdAt: string;
        };
        AdminWorkshopPageDto: {
            items: components["schemas"]["AdminWorkshopView"][];
            total: number;
            page: number;
            pageSize: number;
        };
        FitDeviationsDto: {
            /**
             * @description Upper deviation (ES for a hole, es for a shaft), µm
             * @example 21
             */
            upper: number;
            /**
             * @description Lower deviation (EI for a hole, ei for a shaft), µm
             * @example 0
             */
            lower: number;
        };
        FitClearanceDto: {
            /**
             * @description Largest hole minus smallest shaft, µm
             * @example 41
             */
            max: number;
            /**
             * @description Smallest hole minus largest shaft, µm; negative means interference
             * @example 7
             */
            min: number;
        };
        FitConventionDto: {
            /** @enum {string} */
            jsRounding: "none" | "even";
            /** @example js/JS = ±IT/2 exactly, as in the current ISO 286-2 tables */
            description: string;
        };
        FitLimitsDto: {
            hole: components["schemas"]["FitDeviationsDto"];
            /**
             * @example {
             *       "upper": -7,
             *       "lower": -20
             *     }
             */
            shaft: components["schemas"]["FitDeviationsDto"];
            clearance: components["schemas"]["FitClearanceDto"];
            /** @enum {string} */
            kind: "clearance" | "transition" | "interference";
            /** @description Which js/JS convention the numbers follow */
            convention: components["schemas"]["FitConventionDto"];
        };
        ConvertedLengthDto: {
            /** @example 34.925 */
            value: number;
            /** @enum {string} */
            unit: "in" | "mm";
        };
        SplineLengthDto: {
            /**
             * @description In the designation's own unit
             * @example 1.375
             */
            value: number;
            /** @enum {string} */
            unit: "in" | "mm";
            /** @description The same length in the other unit (1 in = 25.4 mm exactly) */
            converted: components["schemas"]["ConvertedLengthDto"];
        };
        SplineDimensionSetDto: {
            /** @description D = N/P (ANSI B92.1) or m·z (ISO 4156) */
            pitchDiameter: components["schemas"]["SplineLengthDto"];
            /** @description Db = D cos(pressure angle) */
            baseDiameter: components["schemas"]["SplineLengthDto"];
            /** @description π/P or π·m */
            circularPitch: components["schemas"]["SplineLengthDto"];
            basicSpaceWidth: components["schemas"]["SplineLengthDto"];
            basicToothThickness: components["schemas"]["SplineLengthDto"];
            internalMajorDiameter: components["schemas"]["SplineLengthDto"];
            externalMajorDiameter: components["schemas"]["SplineLengthDto"];
            internalMinorDiameter: components["schemas"]["SplineLengthDto"];
            externalMinorDiameter: components["schemas"]["SplineLengthDto"];
            internalFormDiameter: components["schemas"]["SplineLengthDto"];
            externalFormDiameter: components["schemas"]["SplineLengthDto"];
            /** @description Radial form clearance cF */
            formClearance: components["schemas"]["SplineLengthDto"];
        };
        SplineDimensionsDto: {
            /** @example 21T 16/32 DP 30° flat root side fit (ANSI B92.1) */
            designation: string;
            /** @enum {string} */
            standard: "ANSI B92.1" | "ISO 4156 / ANSI B92.2M";
            /** @example 21 */
            teeth: number;
            /** @example 16/32 */
            pitch: string;
            /** @enum {number} */
            pressureAngle: 30 | 37.5 | 45;
            /** @enum {string} */
            root: "flat" | "fillet";
            /** @enum {string} */
            fit: "side" | "major";
            /** @enum {string} */
            unit: "in" | "mm";
            dimensions: components["schemas"]["SplineDimensionSetDto"];
            /** @description The formulas used and what is simplified */
            notes: string[];
        };
        MeasuredDto: {
            /** @example 26.67 */
            value: number;
            /** @enum {string} */
            unit: "in" | "mm";
            /** @example 0.01 */
            resolution: number;
        };
        DeviationDto: {
            /**
             * @description Reading − basic diameter
             * @example -0.42
             */
            value: number;
            /** @enum {string} */
            unit: "in" | "mm";
        };
        SplineCandidateDto: {
            /** @example 20T 20/40 DP 30° flat root side fit (ANSI B92.1) */
            designation: string;
            /** @enum {string} */
            standard: "ANSI B92.1" | "ISO 4156 / ANSI B92.2M";
            /** @example 20/40 */
            pitch: string;
            /** @enum {number} */
            pressureAngle: 30 | 37.5 | 45;
            /** @enum {string} */
            root: "flat" | "fillet";
            /** @description Other forms with the same basic diameter */
            alsoFits: string[];
            basicDiameter: components["schemas"]["SplineLengthDto"];
            deviation: components["schemas"]["DeviationDto"];
            /** @description Whether the reading lies inside the window of the `rule` */
            explainsReading: boolean;
        };
        SplineIdentificationDto: {
            /** @example 20 */
            teeth: number;
            /** @enum {string} */
            feature: "major" | "minor";
            measured: components["schemas"]["MeasuredDto"];
            /** @description Best first, by the size of the deviation */
            candidates: components["schemas"]["SplineCandidateDto"][];
            /** @description Warnings such as the inch/metric swap */
            pitfalls: string[];
            /** @description How explainsReading is decided */
            rule: string;
        };
        ExtractMeasurementsDto: {
            /** @example That leaves fifteen thousandths of an inch. */
            text: string;
        };
        SpokenMeasurementDto: {
            /**
             * @description text.slice(start, end)
             * @example fifteen thousandths of an inch
             */
            phrase: string;
            /**
             * @description Character offset of the first character
             * @example 20
             */
            start: number;
            /**
             * @description Character offset just past the last character
             * @example 50
             */
            end: number;
            /**
             * @description The amount in `unit` (thou, mil and tenths are reported in inches)
             * @example 0.015
             */
            value: number;
            /** @enum {string} */
            unit: "mm" | "um" | "in";
            /**
             * @description The same length in millimetres (1 in = 25.4 mm exactly)
             * @example 0.381
             */
            millimetres: number;
        };
        ExtractedMeasurementsDto: {
            /** @description In text order; at most 1000 */
            measurements: components["schemas"]["SpokenMeasurementDto"][];
            /**
             * @description How many measurements the text holds
             * @example 1
             */
            total: number;
            /**
             * @description True when `measurements` stops short of `total`
             * @example false
             */
            truncated: boolean;
        };
        ParseTranscriptDto: {
            /**
             * @example WEBVTT
             *
             *     00:00:01.000 --> 00:00:04.000
             *     Hello
             */
            text: string;
            /**
             * @default auto
             * @enum {string}
             */
            format: "auto" | "webvtt" | "srt" | "timestamped";
        };
        ParsedCueDto: {
            /** @example 1000 */
            startMs: number;
            /** @example 4000 */
            endMs: number;
            /** @example Hello */
            text: string;
        };
        ParsedTranscriptDto: {
            /** @enum {string} */
            format: "webvtt" | "srt" | "timestamped";
            /** @description In file order; at most 5000 */
            cues: components["schemas"]["ParsedCueDto"][];
            /**
             * @description How many cues the transcript holds
             * @example 1
             */
            total: number;
            /**
             * @description True when `cues` stops short of `total`
             * @example false
             */
            truncated: boolean;
        };
        BuildResponseDto: {
            id: string;
            workshopId: string;
            title: string;
            vehicle: string;
            goal: string;
            /** @enum {string} */
            status: "planning" | "in_progress" | "verified" | "archived";
            createdAt: string;
            updatedAt: string;
        };
        CreateBuildDto: {
            /** @example Motor-to-gearbox coupler */
            title: string;
            /** @example 1980s compact pickup, electric conversion */
            vehicle?: string;
            /** @example Couple the motor shaft to the original gearbox input without re-machining. */
            goal?: string;
            /** @enum {string} */
            status?: "planning" | "in_progress" | "verified" | "archived";
        };
        UpdateBuildDto: {
            /** @example Motor-to-gearbox coupler */
            title?: string;
            /** @example 1980s compact pickup, electric conversion */
            vehicle?: string;
            /** @example Couple the motor shaft to the original gearbox input without re-machining. */
            goal?: string;
            /** @enum {string} */
            status?: "planning" | "in_progress" | "verified" | "archived";
        };
        DeletionImpactItemDto: {
            /**
             * @description What kind of thing
             * @example fitChecks
             */
            key: string;
            /** @example 4 */
            count: number;
            /**
             * @description The count in words, as the studio shows it
             * @example 4 fit checks
             */
            text: string;
            /**
             * @description Deleted with it, or kept but no longer pointing at it
             * @enum {string}
             */
            effect: "deleted" | "unlinked";
        };
        DeletionImpactDto: {
            /** @example Coupler install */
            name: string;
            items: components["schemas"]["DeletionImpactItemDto"][];
        };
        SplineSpecDto: {
            /** @example 21 */
            teeth: number;
            /** @enum {string} */
            gender: "internal" | "external";
            /**
             * @description ANSI B92.1 diametral pitch
             * @example 16
             */
            diametralPitch?: number;
            /** @example 32 */
            stubPitch?: number;
            /**
             * @description ISO 4156 module, mm
             * @example 1.25
             */
            module?: number;
            /**
             * @example 30
             * @enum {number}
             */
            pressureAngle?: 30 | 37.5 | 45;
            /** @enum {string} */
            fit?: "side" | "major";
            /**
             * @example 5
             * @enum {number}
             */
            toleranceClass?: 4 | 5 | 6 | 7;
            /** @example 34925000 */
            majorDiameterNm?: number;
        };
        SplineFeatureResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            partId: string;
            /** @example input spline */
            name: string;
            /**
             * @description The unit the feature is written in
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description The spec's lengths written in `unit` (keys without the Nm), and for a spline its pitch, standard, angle, fit and class
             * @example {
             *       "majorDiameter": "1.375",
             *       "pitch": "16/32 DP",
             *       "standard": "ANSI B92.1"
             *     }
             */
            shown: {
                [key: string]: string;
            };
            /**
             * @description discriminator enum property added by openapi-typescript
             * @enum {string}
             */
            kind: "spline";
            spec: components["schemas"]["SplineSpecDto"];
        };
        DiameterSpecDto: {
            /** @enum {string} */
            role: "hole" | "shaft";
            /** @example 15000000 */
            nominalNm: number;
            /**
             * @description ISO 286 tolerance class
             * @example H7
             */
            toleranceClass?: string;
            /** @example 15018000 */
            maxNm?: number;
            /** @example 15000000 */
            minNm?: number;
        };
        DiameterFeatureResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            partId: string;
            /** @example input spline */
            name: string;
            /**
             * @description The unit the feature is written in
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description The spec's lengths written in `unit` (keys without the Nm), and for a spline its pitch, standard, angle, fit and class
             * @example {
             *       "majorDiameter": "1.375",
             *       "pitch": "16/32 DP",
             *       "standard": "ANSI B92.1"
             *     }
             */
            shown: {
                [key: string]: string;
            };
            /**
             * @description discriminator enum property added by openapi-typescript
             * @enum {string}
             */
            kind: "diameter";
            spec: components["schemas"]["DiameterSpecDto"];
        };
        LengthSpecDto: {
            /** @example 540000000 */
            lengthNm: number;
            /** @example 520000000 */
            compressedNm?: number;
            /** @example 565000000 */
            extendedNm?: number;
        };
        LengthFeatureResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            partId: string;
            /** @example input spline */
            name: string;
            /**
             * @description The unit the feature is written in
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description The spec's lengths written in `unit` (keys without the Nm), and for a spline its pitch, standard, angle, fit and class
             * @example {
             *       "majorDiameter": "1.375",
             *       "pitch": "16/32 DP",
             *       "standard": "ANSI B92.1"
             *     }
             */
            shown: {
                [key: string]: string;
            };
            /**
             * @description discriminator enum property added by openapi-typescript
             * @enum {string}
             */
            kind: "length";
            spec: components["schemas"]["LengthSpecDto"];
        };
        FreeSpecDto: {
            /** @example M10 x 1.25 */
            value: string;
            /** @example N·m */
            unit?: string;
        };
        FreeFeatureResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            partId: string;
            /** @example input spline */
            name: string;
            /**
             * @description The unit the feature is written in
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description The spec's lengths written in `unit` (keys without the Nm), and for a spline its pitch, standard, angle, fit and class
             * @example {
             *       "majorDiameter": "1.375",
             *       "pitch": "16/32 DP",
             *       "standard": "ANSI B92.1"
             *     }
             */
            shown: {
                [key: string]: string;
            };
            /**
             * @description discriminator enum property added by openapi-typescript
             * @enum {string}
             */
            kind: "free";
            spec: components["schemas"]["FreeSpecDto"];
        };
        PartPhotoDto: {
            /** Format: uuid */
            id: string;
            /**
             * @description Address on this API that redirects to a short-lived storage link
             * @example /api/workshops/6f1c…/parts/0b7e…/photos/5d2a…
             */
            url: string;
        };
        PartResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            workshopId: string;
            /** @example HL-2107 */
            partNumber: string;
            /** @example Brackwater Driveline */
            maker: string;
            /** @example 27-tooth motor coupler */
            title: string;
            /** @enum {string} */
            category: "coupler" | "shaft" | "joint" | "bearing" | "bore" | "plate" | "boot" | "seal" | "fastener" | "other";
            /** @enum {string} */
            source: "new" | "remanufactured" | "used" | "original_equipment";
            /** @example  */
            notes: string;
            photos: components["schemas"]["PartPhotoDto"][];
            /** @description By name */
            features: (components["schemas"]["SplineFeatureResponseDto"] | components["schemas"]["DiameterFeatureResponseDto"] | components["schemas"]["LengthFeatureResponseDto"] | components["schemas"]["FreeFeatureResponseDto"])[];
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        FeatureInputDto: {
            /** @example input spline */
            name: string;
            /** @enum {string} */
            kind: "spline" | "diameter" | "length" | "free";
            /**
             * @description Unit of every length of this feature
             * @default mm
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /** @example 21 */
            teeth?: number;
            /** @enum {string} */
            gender?: "internal" | "external";
            /**
             * @description ANSI B92.1 diametral pitch P (the 16 of 16/32)
             * @example 16
             */
            diametralPitch?: number;
            /**
             * @description stub pitch (the 32 of 16/32)
             * @example 32
             */
            stubPitch?: number;
            /**
             * @description ISO 4156 module, mm
             * @example 1.25
             */
            module?: number;
            /**
             * @description spline pressure angle, degrees
             * @example 30
             * @enum {number}
             */
            pressureAngle?: 30 | 37.5 | 45;
            /**
             * @description spline fit: side fit or major-diameter fit
             * @enum {string}
             */
            splineFit?: "side" | "major";
            /**
             * @description spline tolerance class (ANSI B92.1 / ISO 4156)
             * @enum {number}
             */
            splineClass?: 4 | 5 | 6 | 7;
            /** @example 1.375 */
            majorDiameter?: string;
            /** @enum {string} */
            role?: "hole" | "shaft";
            /** @example 15 */
            nominal?: string;
            /**
             * @description ISO 286 tolerance class
             * @example H7
             */
            toleranceClass?: string;
            /**
             * @description largest allowed size, when given instead of a class
             * @example 15.018
             */
            max?: string;
            /** @example 15.000 */
            min?: string;
            /**
             * @description overall length
             * @example 540
             */
            length?: string;
            /**
             * @description fully compressed length of a plunging shaft
             * @example 520
             */
            compressed?: string;
            /**
             * @description fully extended length of a plunging shaft
             * @example 565
             */
            extended?: string;
            /** @example M10 x 1.25 */
            value?: string;
            /** @example N·m */
            freeUnit?: string;
        };
        CreatePartDto: {
            /** @example HL-2107 */
            partNumber: string;
            /** @example Brackwater Driveline */
            maker?: string;
            /** @example 27-tooth motor coupler */
            title: string;
            /** @enum {string} */
            category: "coupler" | "shaft" | "joint" | "bearing" | "bore" | "plate" | "boot" | "seal" | "fastener" | "other";
            /**
             * @default new
             * @enum {string}
             */
            source: "new" | "remanufactured" | "used" | "original_equipment";
            notes?: string;
            features?: components["schemas"]["FeatureInputDto"][];
        };
        UpdatePartDto: {
            /** @example HL-2107 */
            partNumber?: string;
            /** @example Brackwater Driveline */
            maker?: string;
            /** @example 27-tooth motor coupler */
            title?: string;
            /** @enum {string} */
            category?: "coupler" | "shaft" | "joint" | "bearing" | "bore" | "plate" | "boot" | "seal" | "fastener" | "other";
            /**
             * @default new
             * @enum {string}
             */
            source: "new" | "remanufactured" | "used" | "original_equipment";
            notes?: string;
        };
        UpdateFeatureDto: {
            /** @example input spline */
            name?: string;
            /** @enum {string} */
            kind?: "spline" | "diameter" | "length" | "free";
            /**
             * @description Unit of every length of this feature
             * @default mm
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /** @example 21 */
            teeth?: number;
            /** @enum {string} */
            gender?: "internal" | "external";
            /**
             * @description ANSI B92.1 diametral pitch P (the 16 of 16/32)
             * @example 16
             */
            diametralPitch?: number;
            /**
             * @description stub pitch (the 32 of 16/32)
             * @example 32
             */
            stubPitch?: number;
            /**
             * @description ISO 4156 module, mm
             * @example 1.25
             */
            module?: number;
            /**
             * @description spline pressure angle, degrees
             * @example 30
             * @enum {number}
             */
            pressureAngle?: 30 | 37.5 | 45;
            /**
             * @description spline fit: side fit or major-diameter fit
             * @enum {string}
             */
            splineFit?: "side" | "major";
            /**
             * @description spline tolerance class (ANSI B92.1 / ISO 4156)
             * @enum {number}
             */
            splineClass?: 4 | 5 | 6 | 7;
            /** @example 1.375 */
            majorDiameter?: string;
            /** @enum {string} */
            role?: "hole" | "shaft";
            /** @example 15 */
            nominal?: string;
            /**
             * @description ISO 286 tolerance class
             * @example H7
             */
            toleranceClass?: string;
            /**
             * @description largest allowed size, when given instead of a class
             * @example 15.018
             */
            max?: string;
            /** @example 15.000 */
            min?: string;
            /**
             * @description overall length
             * @example 540
             */
            length?: string;
            /**
             * @description fully compressed length of a plunging shaft
             * @example 520
             */
            compressed?: string;
            /**
             * @description fully extended length of a plunging shaft
             * @example 565
             */
            extended?: string;
            /** @example M10 x 1.25 */
            value?: string;
            /** @example N·m */
            freeUnit?: string;
        };
        InstrumentResponseDto: {
            /** @enum {string} */
            kind: "outside_micrometer" | "inside_micrometer" | "bore_gauge" | "caliper" | "dial_indicator" | "feeler_gauge" | "tape" | "other";
            /** @example 2540 */
            resolutionNm: number;
            /**
             * @description The resolution in the reading’s unit
             * @example 0.0001
             */
            resolution: string;
            /** @example 2026-03-02 */
            calibratedOn: string | null;
            /** @example  */
            note: string;
        };
        MeasurementResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            featureId: string | null;
            /** Format: uuid */
            interfaceId: string | null;
            /** @enum {string} */
            quantity: "diameter" | "length" | "clearance" | "runout" | "other";
            /**
             * @description As written by the person who took it
             * @example 1.2505
             */
            value: string;
            /** @enum {string} */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description The reading in integer nanometres
             * @example 31762700
             */
            valueNm: number;
            /**
             * @description In its unit, with as many decimals as the instrument resolves
             * @example 1.2505 in
             */
            shown: string;
            instrument: components["schemas"]["InstrumentResponseDto"];
            /** @example 21.5 */
            temperatureC: number | null;
            /**
             * Format: uuid
             * @description The member who took it
             */
            takenBy: string | null;
            /** Format: date-time */
            takenAt: string;
            /** Format: uuid */
            footageId: string | null;
            /** @description The moment in the footage that shows the reading */
            footageTimeMs: number | null;
            /** @example  */
            note: string;
        };
        MeasurementSummaryDto: {
            /** @example 3 */
            count: number;
            /**
             * @description The unit of the latest reading
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            meanNm: number;
            spreadNm: number;
            /** @example 1.2505 in */
            mean: string;
            /** @example 0.0002 in */
            spread: string;
        };
        MeasurementListDto: {
            /** @description Oldest first */
            measurements: components["schemas"]["MeasurementResponseDto"][];
            /** @description Mean and spread when one subject (feature or interface) is asked for */
            summary: components["schemas"]["MeasurementSummaryDto"] | null;
        };
        CreateMeasurementDto: {
            /** @description The part feature measured (give this or interfaceId) */
            featureId?: string;
            /** @description The interface measured, e.g. a clearance between two parts */
            interfaceId?: string;
            /** @enum {string} */
            quantity: "diameter" | "length" | "clearance" | "runout" | "other";
            /**
             * @description The reading exactly as taken, in `unit`
             * @example 0.6692
             */
            value: string;
            /** @enum {string} */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /** @enum {string} */
            instrumentKind: "outside_micrometer" | "inside_micrometer" | "bore_gauge" | "caliper" | "dial_indicator" | "feeler_gauge" | "tape" | "other";
            /**
             * @description The instrument's smallest step, in `unit`
             * @example 0.0001
             */
            resolution: string;
            /** @example 2026-09-14 */
            calibratedOn?: string;
            /** @example 0–1 in outside micrometer, ratchet stop */
            instrumentNote?: string;
            /** @example 20.5 */
            temperatureC?: number;
            /** @description When it was taken (defaults to now) */
            takenAt?: string;
            /** @description The footage that shows the reading */
            footageId?: string;
            /**
             * @description Time in that footage, ms
             * @example 95000
             */
            footageTimeMs?: number;
            note?: string;
        };
        /**
         * @description The roll-up of the required checks
         * @enum {string}
         */
        ChecklistVerdict: "open" | "bench_pass" | "confirmed" | "no_fit";
        /** @enum {string} */
        FitCheckState: "open" | "bench_pass" | "confirmed" | "no_fit" | "retired";
        EvidenceResponseDto: {
            /** Format: uuid */
            id: string;
            /** @enum {string} */
            kind: "measurement" | "mark" | "photo";
            /** Format: uuid */
            measurementId: string | null;
            /** Format: uuid */
            markId: string | null;
            /**
             * @description For a photo: its address on this API, which redirects to a short-lived storage link
             * @example /api/workshops/6f1c…/checks/2a9d…/evidence/7c3e…/photo
             */
            photoUrl: string | null;
            /** @example Coupler fully engaged, motor bolted up. */
            note: string;
            /** Format: uuid */
            addedBy: string | null;
            /** Format: date-time */
            createdAt: string;
        };
        FitCheckResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            assemblyId: string;
            /**
             * Format: uuid
             * @description Set for a check derived from an interface
             */
            interfaceId: string | null;
            /** @enum {string} */
            kind: "spline_match" | "fit" | "length_window" | "manual";
            /** @description Derived from an interface (true) or added by hand (false) */
            derived: boolean;
            /** @example Input spline matches the motor shaft */
            title: string;
            /** @example true */
            required: boolean;
            state: components["schemas"]["FitCheckState"];
            /**
             * @description The engine's last verdict for a derived check
             * @enum {string|null}
             */
            outcome: "pass" | "fail" | "unknown" | null;
            /**
             * @description The engine's numbers for a derived check (nanometres unless a key says otherwise)
             * @example {
             *       "minClearanceNm": 2540,
             *       "clearanceMeasuredNm": 12700
             *     }
             */
            detail: {
                [key: string]: unknown;
            } | null;
            /** @example Test-fitted with the motor bolted up; turns by hand with no bind. */
            reason: string;
            /** Format: uuid */
            confirmedBy: string | null;
            /** Format: date-time */
            confirmedAt: string | null;
            /** @description Oldest first */
            evidence: components["schemas"]["EvidenceResponseDto"][];
            /** Format: date-time */
            updatedAt: string;
        };
        ChecklistResponseDto: {
            /** @description The roll-up of the required checks */
            verdict: components["schemas"]["ChecklistVerdict"];
            /** @description In the order they were added */
            checks: components["schemas"]["FitCheckResponseDto"][];
        };
        CreateManualCheckDto: {
            /** @example Test-fitted on the vehicle: coupler engages fully */
            title: string;
            /** @default true */
            required: boolean;
        };
        TransitionDto: {
            to: components["schemas"]["FitCheckState"];
            /** @example Test-fitted with the motor bolted up; turns by hand with no bind. */
            reason: string;
            /** @description The state the caller saw and expects to leave; if the check is no longer in it, 409 and nothing changes */
            from?: components["schemas"]["FitCheckState"];
        };
        AddEvidenceDto: {
            /**
             * @description Photos come through the photos route
             * @enum {string}
             */
            kind: "measurement" | "mark";
            /** @description For kind `measurement` */
            measurementId?: string;
            /** @description For kind `mark`: a moment in this workshop's footage that shows the fit */
            markId?: string;
            note?: string;
        };
        FitCheckEventResponseDto: {
            /** Format: uuid */
            id: string;
            /** @description Null for the first state */
            from: components["schemas"]["FitCheckState"] | null;
            to: components["schemas"]["FitCheckState"];
            /** @example Bore re-measured after honing */
            reason: string;
            /**
             * Format: uuid
             * @description Null when the fit engine changed the state
             */
            actorId: string | null;
            /**
             * @description The member's display name; null for the fit engine
             * @example Rowan Hale
             */
            actorName: string | null;
            /** Format: date-time */
            at: string;
        };
        WhatIfResponseDto: {
            /**
             * @description The measured clearance, nm
             * @example 406400
             */
            clearanceNm: number;
            /**
             * @description The change in size, nm
             * @example 10160
             */
            deltaNm: number;
            /** @example 10.16 */
            deltaUm: number;
            /** @example 0.4 */
            deltaThou: number;
            /**
             * @description Share of the clearance the change takes, %; null without a positive clearance
             * @example 2.5
             */
            sharePercent: number | null;
            /** @example 396240 */
            remainingClearanceNm: number;
            /** @enum {string} */
            remainingKind: "clearance" | "interference";
        };
        AssemblyResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            buildId: string;
            /** @example 21-tooth coupler with the long driveshaft */
            name: string;
            /** @example  */
            notes: string;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        CreateAssemblyDto: {
            /** @example 21-tooth coupler with the long driveshaft */
            name: string;
            notes?: string;
        };
        AssemblyPlacementDto: {
            /** @example input side */
            position: string;
            /** @example 0 */
            sortOrder: number;
            part: components["schemas"]["PartResponseDto"];
        };
        InterfaceResponseDto: {
            /** Format: uuid */
            id: string;
            /** @enum {string} */
            kind: "spline" | "bore_shaft" | "length_window";
            /** @example Motor shaft into coupler */
            name: string;
            /** Format: uuid */
            featureAId: string;
            /** Format: uuid */
            featureBId: string | null;
            /**
             * @description The unit lengths are shown in (feature A’s)
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            installedMinNm: number | null;
            installedMaxNm: number | null;
            marginNm: number | null;
            /** @example 412.0 */
            installedMin: string | null;
            /** @example 418.5 */
            installedMax: string | null;
            /** @example 3.0 */
            margin: string | null;
        };
        AssemblyDetailDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            buildId: string;
            /** @example 21-tooth coupler with the long driveshaft */
            name: string;
            /** @example  */
            notes: string;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
            /** @description By sortOrder, then position */
            parts: components["schemas"]["AssemblyPlacementDto"][];
            interfaces: components["schemas"]["InterfaceResponseDto"][];
        };
        UpdateAssemblyDto: {
            /** @example 21-tooth coupler with the long driveshaft */
            name?: string;
            notes?: string;
        };
        PlacePartDto: {
            /** @example input side */
            position: string;
            /** @example 1 */
            sortOrder?: number;
        };
        CreateInterfaceDto: {
            /** @enum {string} */
            kind: "spline" | "bore_shaft" | "length_window";
            /** @example coupler to gearbox input */
            name: string;
            /** @description spline: one spline; bore_shaft: the hole or the shaft; length_window: the length feature */
            featureAId: string;
            /** @description spline: the mating spline; bore_shaft: the other diameter */
            featureBId?: string;
            /**
             * @description Unit of installedMin, installedMax and margin
             * @default mm
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description length_window: shortest installed length
             * @example 530
             */
            installedMin?: string;
            /**
             * @description length_window: longest installed length
             * @example 555
             */
            installedMax?: string;
            /**
             * @description length_window: travel that must remain each way; bore_shaft: the least clearance you accept
             * @example 5
             */
            margin?: string;
        };
        UpdateInterfaceDto: {
            /** @enum {string} */
            kind?: "spline" | "bore_shaft" | "length_window";
            /** @example coupler to gearbox input */
            name?: string;
            /** @description spline: one spline; bore_shaft: the hole or the shaft; length_window: the length feature */
            featureAId?: string;
            /** @description spline: the mating spline; bore_shaft: the other diameter */
            featureBId?: string;
            /**
             * @description Unit of installedMin, installedMax and margin
             * @default mm
             * @enum {string}
             */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /**
             * @description length_window: shortest installed length
             * @example 530
             */
            installedMin?: string;
            /**
             * @description length_window: longest installed length
             * @example 555
             */
            installedMax?: string;
            /**
             * @description length_window: travel that must remain each way; bore_shaft: the least clearance you accept
             * @example 5
             */
            margin?: string;
        };
        FootageTypeDto: {
            /** @example mp4 */
            extension: string;
            /**
             * @example [
             *       "video/mp4"
             *     ]
             */
            mimeTypes: string[];
        };
        FootageLimitsDto: {
            /** @example 20000000000 */
            maxBytes: number;
            types: components["schemas"]["FootageTypeDto"][];
            /** @description Largest transcript file or pasted text, in bytes */
            transcriptMaxBytes: number;
            transcriptMaxCues: number;
        };
        UploadProgressDto: {
            partCount: number;
            completedPartCount: number;
            uploadedBytes: number;
        };
        TranscriptSummaryDto: {
            revision: number;
            cueCount: number;
        };
        RenditionVariantDto: {
            /** @example 1920 */
            width: number;
            /** @example 1080 */
            height: number;
            /**
             * @description Peak bit rate as the master playlist declares it (bit/s)
             * @example 5640800
             */
            bandwidth: number;
        };
        RenditionsDto: {
            /**
             * @description waiting: queued (or the footage is not probed yet)
             * @enum {string}
             */
            state: "waiting" | "processing" | "ready" | "failed";
            /**
             * @description Percent done while processing; 100 when ready
             * @example 42.5
             */
            percent: number | null;
            /**
             * @description Estimated seconds left while processing
             * @example 37
             */
            secondsLeft: number | null;
            /** @description Why the web versions could not be made, in plain words */
            reason: string | null;
            /** @description The renditions made, highest first; empty until ready */
            variants: components["schemas"]["RenditionVariantDto"][];
        };
        FootageResponseDto: {
            id: string;
            workshopId: string;
            buildId: string;
            title: string;
            originalName: string;
            contentType: string;
            sizeBytes: number;
            /** @enum {string} */
            state: "uploading" | "processing" | "ready" | "failed";
            /** @description Why processing failed, in words for the creator */
            failureReason: string | null;
            durationMs: number | null;
            width: number | null;
            height: number | null;
            frameRate: number | null;
            container: string | null;
            videoCodec: string | null;
            audioCodec: string | null;
            /** @description Short-lived link to the poster frame */
            posterUrl: string | null;
            /** @description Only while uploading */
            upload: components["schemas"]["UploadProgressDto"] | null;
            /** @description The active transcript, if any */
            transcript: components["schemas"]["TranscriptSummaryDto"] | null;
            /** @description Width as displayed (after rotation); known once renditions start */
            displayWidth: number | null;
            displayHeight: number | null;
            /** @description The web renditions (HLS, MP4, scrub previews, waveform) */
            renditions: components["schemas"]["RenditionsDto"];
            /** @description False once the workshop setting dropped the original after transcoding */
            originalKept: boolean;
            createdAt: string;
            updatedAt: string;
        };
        CreateFootageDto: {
            /**
             * @description The file name as the browser gives it; sanitised before it is stored
             * @example coupler-spline-check.mp4
             */
            fileName: string;
            /**
             * @description The browser's MIME type for the file (may be empty when it does not know)
             * @example video/mp4
             */
            contentType: string;
            /**
             * @description File size in bytes
             * @example 734003200
             */
            sizeBytes: number;
            /**
             * @description Defaults to the file name without its extension
             * @example Coupler spline check
             */
            title?: string;
        };
        UploadedPartDto: {
            partNumber: number;
            etag: string;
        };
        UploadStateDto: {
            /** @description Bytes in every part but the last */
            partSizeBytes: number;
            partCount: number;
            sizeBytes: number;
            /** @description The file name the upload was started with (sanitised) */
            fileName: string;
            /** @description Parts storage has confirmed, in part order */
            completedParts: components["schemas"]["UploadedPartDto"][];
        };
        CreateFootageResponseDto: {
            footage: components["schemas"]["FootageResponseDto"];
            upload: components["schemas"]["UploadStateDto"];
        };
        UpdateFootageDto: {
            /** @example Coupler spline check */
            title: string;
        };
        PlaybackResponseDto: {
            /** @description Presigned GET URL of a progressive file (the MP4 rendition once ready, else the original); HTTP Range works */
            url: string;
            expiresAt: string;
            contentType: string;
            /**
             * @description HLS master playlist (API path) once renditions are ready
             * @example /api/workshops/…/footage/…/hls/master.m3u8
             */
            hlsUrl: string | null;
            /** @description Presigned link to the faststart H.264/AAC MP4 once ready */
            mp4Url: string | null;
            /** @description WebVTT thumbnails track (API path); cue texts are sprite links with #xywh= */
            thumbnailsUrl: string | null;
            /** @description Waveform peaks (API path, WaveformDto) */
            waveformUrl: string | null;
            displayWidth: number | null;
            displayHeight: number | null;
            renditions: components["schemas"]["RenditionsDto"];
        };
        PartUrlsRequestDto: {
            /**
             * @description Part numbers to sign (1-based), at most 100 per request
             * @example [
             *       1,
             *       2,
             *       3,
             *       4
             *     ]
             */
            partNumbers: string[];
        };
        PartUrlDto: {
            partNumber: number;
            /** @description Presigned PUT URL; send the part bytes as the body, no credentials */
            url: string;
        };
        PartUrlsResponseDto: {
            expiresAt: string;
            urls: components["schemas"]["PartUrlDto"][];
        };
        RecordPartDto: {
            /**
             * @description The ETag header storage answered the part upload with: a part's MD5 in hex, quoted or bare
             * @example "9b2cf535f27731c974343645a3985328"
             */
            etag: string;
        };
        RecordPartResponseDto: {
            partNumber: number;
            completedPartCount: number;
            partCount: number;
        };
        WaveformDto: {
            durationMs: number;
            /**
             * @description Peaks per second of footage
             * @example 20
             */
            peaksPerSecond: number;
            /** @description False when the source had no audio (the renditions carry silence) */
            hasAudio: boolean;
            /** @description Largest absolute sample of each slice, 0..1 of full scale */
            peaks: number[];
        };
        MediaSettingsDto: {
            /** @description Keep the uploaded original after web versions are made (default true) */
            keepOriginals: boolean;
        };
        CueDto: {
            /** @description Position in the transcript, from 0 */
            index: number;
            startMs: number;
            endMs: number;
            text: string;
        };
        TranscriptDto: {
            id: string;
            footageId: string;
            revision: number;
            /** @enum {string} */
            format: "webvtt" | "srt" | "timestamped";
            /** @description The attached file name; null when pasted */
            sourceName: string | null;
            cueCount: number;
            isActive: boolean;
            createdAt: string;
            cues: components["schemas"]["CueDto"][];
        };
        AttachTranscriptDto: {
            /**
             * @description WebVTT, SubRip or timestamped lines ("[1:02] text"); at most 2 MB
             * @example WEBVTT
             *
             *     00:00:01.000 --> 00:00:04.000
             *     The spline counts twenty-one teeth.
             */
            text: string;
            /**
             * @default auto
             * @enum {string}
             */
            format: "auto" | "webvtt" | "srt" | "timestamped";
        };
        TranscriptRevisionDto: {
            id: string;
            footageId: string;
            revision: number;
            /** @enum {string} */
            format: "webvtt" | "srt" | "timestamped";
            /** @description The attached file name; null when pasted */
            sourceName: string | null;
            cueCount: number;
            isActive: boolean;
            createdAt: string;
        };
        CueMatchDto: {
            cueIndex: number;
            startMs: number;
            endMs: number;
            text: string;
        };
        FootageSearchResponseDto: {
            /** @description The words searched for */
            terms: string[];
            /** @description How many cues match in all; results holds at most `limit` of them */
            total: number;
            /** @description Where this page starts among all the hits */
            offset: number;
            /** @description Matching cues of the active transcript, in time order */
            results: components["schemas"]["CueMatchDto"][];
        };
        HitMomentsResponseDto: {
            /** @description The words searched for */
            terms: string[];
            /** @description How many cues match */
            total: number;
            /** @description Start of every matching cue of the active transcript, ms, in time order */
            startMs: number[];
        };
        WorkshopCueMatchDto: {
            cueIndex: number;
            startMs: number;
            endMs: number;
            text: string;
            footageId: string;
            footageTitle: string;
            buildId: string;
            buildTitle: string;
        };
        WorkshopSearchResponseDto: {
            terms: string[];
            /** @description How many cues match in all; results holds at most `limit` of them */
            total: number;
            /** @description Where this page starts among all the hits */
            offset: number;
            /** @description Matching cues of the workshop's active transcripts, best first */
            results: components["schemas"]["WorkshopCueMatchDto"][];
        };
        MarkResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            footageId: string;
            /**
             * @description Where it starts in the footage, ms
             * @example 95000
             */
            startMs: number;
            /**
             * @description Null for a moment rather than a span
             * @example 101500
             */
            endMs: number | null;
            /** @enum {string} */
            kind: "part" | "measurement" | "check_evidence" | "step" | "caution" | "note";
            /** Format: uuid */
            partId: string | null;
            /** Format: uuid */
            measurementId: string | null;
            /** Format: uuid */
            fitCheckId: string | null;
            /** Format: uuid */
            guideStepId: string | null;
            /** @example Pilot bore on the bore gauge */
            label: string;
            /** Format: uuid */
            createdBy: string | null;
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        CreateMarkDto: {
            /**
             * Format: uuid
             * @description For kind `part`
             */
            partId?: string | null;
            /**
             * Format: uuid
             * @description For kind `measurement`
             */
            measurementId?: string | null;
            /**
             * Format: uuid
             * @description For kind `check_evidence`
             */
            fitCheckId?: string | null;
            /**
             * Format: uuid
             * @description For kind `step`: a step of one of the workshop’s guides
             */
            guideStepId?: string | null;
            /**
             * @description Time in the footage, ms
             * @example 95000
             */
            startMs: number;
            /**
             * @description End of a span, ms (after startMs)
             * @example 101500
             */
            endMs?: number | null;
            /** @enum {string} */
            kind: "part" | "measurement" | "check_evidence" | "step" | "caution" | "note";
            /**
             * @default
             * @example Coupler seats on the input shaft
             */
            label: string;
        };
        UpdateMarkDto: {
            /**
             * Format: uuid
             * @description For kind `part`
             */
            partId?: string | null;
            /**
             * Format: uuid
             * @description For kind `measurement`
             */
            measurementId?: string | null;
            /**
             * Format: uuid
             * @description For kind `check_evidence`
             */
            fitCheckId?: string | null;
            /**
             * Format: uuid
             * @description For kind `step`: a step of one of the workshop’s guides
             */
            guideStepId?: string | null;
            startMs?: number;
            /** @description End of a span, ms (after startMs); null makes it a moment */
            endMs?: number | null;
            /** @enum {string} */
            kind?: "part" | "measurement" | "check_evidence" | "step" | "caution" | "note";
            label?: string;
        };
        MarkSuggestionResponseDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            footageId: string;
            /**
             * Format: uuid
             * @description The transcript revision it was mined from
             */
            transcriptId: string | null;
            /**
             * @description The cue it was heard in
             * @example 12
             */
            cueIndex: number;
            /** @example 95000 */
            startMs: number;
            /** @example 98200 */
            endMs: number;
            /** @enum {string} */
            kind: "measurement" | "part";
            /**
             * @description What was said
             * @example fifteen thousandths of an inch
             */
            phrase: string;
            /**
             * @description The spoken amount as decimal text in `unit`
             * @example 0.015
             */
            value: string | null;
            /** @enum {string|null} */
            unit: "mm" | "um" | "in" | null;
            /** @example 0.381 */
            millimetres: number | null;
            /**
             * Format: uuid
             * @description For kind `part`: the part whose number was said
             */
            partId: string | null;
            /** @enum {string} */
            status: "pending" | "accepted" | "dismissed";
            /**
             * Format: uuid
             * @description The mark made when it was accepted
             */
            markId: string | null;
        };
        AcceptSuggestionDto: {
            /** @description Measurement suggestions: the part feature measured (or interfaceId) */
            featureId?: string;
            /** @description Measurement suggestions: the interface measured (or featureId) */
            interfaceId?: string;
            /**
             * @default other
             * @enum {string}
             */
            quantity: "diameter" | "length" | "clearance" | "runout" | "other";
            /**
             * @default other
             * @enum {string}
             */
            instrumentKind: "outside_micrometer" | "inside_micrometer" | "bore_gauge" | "caliper" | "dial_indicator" | "feeler_gauge" | "tape" | "other";
            /**
             * @description Defaults to one step of the last spoken digit, in the suggestion's unit
             * @example 0.001
             */
            resolution?: string;
            /** @description The mark's label (defaults to the spoken phrase) */
            label?: string;
        };
        AcceptedSuggestionResponseDto: {
            suggestion: components["schemas"]["MarkSuggestionResponseDto"];
            mark: components["schemas"]["MarkResponseDto"];
            /** @description The reading recorded from a spoken measurement */
            measurement: components["schemas"]["MeasurementResponseDto"] | null;
        };
        GuidePublishedRevisionDto: {
            /** @example 2 */
            number: number;
            /** Format: date-time */
            publishedAt: string;
            /** @example Added the boot clamp step */
            note: string;
        };
        GuideSummaryDto: {
            /** @enum {string} */
            status: "draft" | "published";
            /** @description The draft differs from the published revision */
            hasUnpublishedChanges: boolean;
            publishedRevision: components["schemas"]["GuidePublishedRevisionDto"] | null;
            /** @example /guides/hollow-lane-garage/swapping-the-motor-coupler */
            publicPath: string | null;
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            buildId: string;
            /** @example Swapping the motor coupler */
            title: string;
            /** @example swapping-the-motor-coupler */
            slug: string;
            /** @example 6 */
            stepCount: number;
            /** @enum {string|null} */
            skillLevel: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /** @example 90 */
            estimatedMinutes: number | null;
            /** Format: date-time */
            updatedAt: string;
        };
        CreateGuideDto: {
            /**
             * @description HTML (sanitised)
             * @example <p>How the 21-tooth coupler stack goes together.</p>
             */
            summary?: string;
            /**
             * Format: uuid
             * @description The footage viewers follow (a footage of the same build)
             */
            footageId?: string | null;
            /**
             * Format: uuid
             * @description Its checklist and parts go in the guide (an assembly of the same build)
             */
            assemblyId?: string | null;
            safetyTopics?: ("lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing")[];
            /**
             * @example [
             *       "Torque wrench, 20–100 N·m",
             *       "Outside micrometer 25–50 mm"
             *     ]
             */
            tools?: string[];
            /**
             * @example [
             *       "Anti-seize compound",
             *       "Medium-strength thread locker"
             *     ]
             */
            consumables?: string[];
            /**
             * @description What the reader should already be able to do; null clears it
             * @enum {string|null}
             */
            skillLevel?: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /**
             * @description Estimated time of the whole job, whole minutes (1–6000); null clears it
             * @example 180
             */
            estimatedMinutes?: number | null;
            /** @example Fitting the 21-tooth coupler stack */
            title: string;
        };
        GuideCautionDto: {
            /** @enum {string} */
            level: "DANGER" | "WARNING" | "CAUTION" | "NOTICE";
            /** @example Support the shaft before pulling the coupler; it drops when it clears the spline. */
            text: string;
        };
        GuideStepResponseDto: {
            /** Format: uuid */
            id: string;
            /** @example 1 */
            position: number;
            /** @example Pull the old coupler */
            title: string;
            /**
             * @description Cleaned rich text (HTML)
             * @example <p>Back off the clamp bolt two turns.</p>
             */
            body: string;
            /** Format: uuid */
            footageId: string | null;
            /** @example 95000 */
            startMs: number | null;
            /** @example 131000 */
            endMs: number | null;
            caution: components["schemas"]["GuideCautionDto"] | null;
            /** @example 15 */
            estimatedMinutes: number | null;
            /** @description Marks tied to this step */
            marks: components["schemas"]["MarkResponseDto"][];
        };
        GuideResponseDto: {
            /** @enum {string} */
            status: "draft" | "published";
            /** @description The draft differs from the published revision */
            hasUnpublishedChanges: boolean;
            publishedRevision: components["schemas"]["GuidePublishedRevisionDto"] | null;
            /** @example /guides/hollow-lane-garage/swapping-the-motor-coupler */
            publicPath: string | null;
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            workshopId: string;
            /** Format: uuid */
            buildId: string;
            /** @example Swapping the motor coupler */
            title: string;
            /** @example swapping-the-motor-coupler */
            slug: string;
            /** @example Fit a 21-tooth coupler to the motor shaft and check it engages fully. */
            summary: string;
            /** Format: uuid */
            footageId: string | null;
            /** Format: uuid */
            assemblyId: string | null;
            /** @description Chosen by the creator */
            safetyTopics: ("lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing")[];
            /** @description Found in the guide's text, for the creator to consider */
            detectedSafetyTopics: ("lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing")[];
            /**
             * @example [
             *       "13 mm socket",
             *       "soft-faced mallet"
             *     ]
             */
            tools: string[];
            /**
             * @example [
             *       "anti-seize"
             *     ]
             */
            consumables: string[];
            /** @enum {string|null} */
            skillLevel: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /** @example 90 */
            estimatedMinutes: number | null;
            /** @description By position */
            steps: components["schemas"]["GuideStepResponseDto"][];
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        GuideStepChoiceDto: {
            /** Format: uuid */
            id: string;
            /** Format: uuid */
            guideId: string;
            /** @example Swapping the motor coupler */
            guideTitle: string;
            /** @example 1 */
            position: number;
            /** @example Pull the old coupler */
            title: string;
            /** @example 95000 */
            startMs: number | null;
        };
        UpdateGuideDto: {
            /**
             * @description HTML (sanitised)
             * @example <p>How the 21-tooth coupler stack goes together.</p>
             */
            summary?: string;
            /**
             * Format: uuid
             * @description The footage viewers follow (a footage of the same build)
             */
            footageId?: string | null;
            /**
             * Format: uuid
             * @description Its checklist and parts go in the guide (an assembly of the same build)
             */
            assemblyId?: string | null;
            safetyTopics?: ("lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing")[];
            /**
             * @example [
             *       "Torque wrench, 20–100 N·m",
             *       "Outside micrometer 25–50 mm"
             *     ]
             */
            tools?: string[];
            /**
             * @example [
             *       "Anti-seize compound",
             *       "Medium-strength thread locker"
             *     ]
             */
            consumables?: string[];
            /**
             * @description What the reader should already be able to do; null clears it
             * @enum {string|null}
             */
            skillLevel?: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /**
             * @description Estimated time of the whole job, whole minutes (1–6000); null clears it
             * @example 180
             */
            estimatedMinutes?: number | null;
            title?: string;
        };
        StepCautionDto: {
            /**
             * @description ANSI Z535 signal word
             * @enum {string}
             */
            level: "DANGER" | "WARNING" | "CAUTION" | "NOTICE";
            /** @example Support the truck on stands before going underneath. */
            text: string;
        };
        CreateStepDto: {
            /** @description HTML (sanitised) */
            body?: string;
            /**
             * Format: uuid
             * @description A footage of the guide’s build; defaults to the guide’s footage when a time is given
             */
            footageId?: string | null;
            /**
             * @description The step’s moment in the footage, ms
             * @example 42000
             */
            startMs?: number | null;
            /** @description End of the step’s span, ms (after startMs) */
            endMs?: number | null;
            caution?: components["schemas"]["StepCautionDto"] | null;
            /**
             * @description Estimated time of this step, whole minutes (1–1440); null clears it
             * @example 20
             */
            estimatedMinutes?: number | null;
            /** @example Seat the coupler on the motor shaft */
            title: string;
        };
        ReorderStepsDto: {
            /** @description Every step of the guide exactly once, in the new order */
            stepIds: string[];
        };
        UpdateStepDto: {
            /** @description HTML (sanitised) */
            body?: string;
            /**
             * Format: uuid
             * @description A footage of the guide’s build; defaults to the guide’s footage when a time is given
             */
            footageId?: string | null;
            /**
             * @description The step’s moment in the footage, ms
             * @example 42000
             */
            startMs?: number | null;
            /** @description End of the step’s span, ms (after startMs) */
            endMs?: number | null;
            caution?: components["schemas"]["StepCautionDto"] | null;
            /**
             * @description Estimated time of this step, whole minutes (1–1440); null clears it
             * @example 20
             */
            estimatedMinutes?: number | null;
            title?: string;
        };
        PublishRevisionDto: {
            /** @example Added the runout reading to step 3. */
            note?: string;
        };
        GuideRevisionPublisherDto: {
            /** @example Rowan Hale */
            displayName: string;
        };
        GuideRevisionResponseDto: {
            /** @example 2 */
            number: number;
            /** @example Added the boot clamp step */
            note: string;
            /** Format: date-time */
            publishedAt: string;
            /** @description Null when the publisher has no account any more, and in the answer to publishing */
            publishedBy: components["schemas"]["GuideRevisionPublisherDto"] | null;
        };
        PublicWorkshopRefDto: {
            /** @example Hollow Lane Garage */
            name: string;
            /** @example hollow-lane-garage */
            slug: string;
        };
        PublishedGuideSummaryDto: {
            workshop: components["schemas"]["PublicWorkshopRefDto"];
            /** @example swapping-the-motor-coupler */
            slug: string;
            /** @example Swapping the motor coupler */
            title: string;
            /** @example Cargo trike drive refit */
            buildTitle: string;
            /**
             * Format: date-time
             * @example 2026-11-02T09:30:00.000Z
             */
            publishedAt: string;
            /**
             * @description The published revision’s number
             * @example 2
             */
            revision: number;
            /** @example 6 */
            stepCount: number;
            /**
             * @description Null when the author gave none
             * @enum {string|null}
             */
            skillLevel: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /**
             * @description Null when the author gave none
             * @example 90
             */
            estimatedMinutes: number | null;
            /**
             * @description Redirects to the footage’s poster; null without one
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/poster
             */
            posterUrl: string | null;
            /**
             * @description The studio’s address of the guide
             * @example /guides/hollow-lane-garage/swapping-the-motor-coupler
             */
            path: string;
        };
        PublishedGuideInfoDto: {
            /** @example Swapping the motor coupler */
            title: string;
            /** @example swapping-the-motor-coupler */
            slug: string;
            /**
             * @description Cleaned rich text (HTML)
             * @example <p>Fit a 21-tooth coupler to the motor shaft and check it engages fully.</p>
             */
            summary: string;
            /** @example Cargo trike drive refit */
            buildTitle: string;
            /** @example Three-wheel cargo trike, 250 W hub drive */
            vehicle: string | null;
            /**
             * @example [
             *       "13 mm socket",
             *       "soft-faced mallet"
             *     ]
             */
            tools: string[];
            /**
             * @example [
             *       "anti-seize"
             *     ]
             */
            consumables: string[];
            /** @description Chosen by the creator or found in the guide’s text */
            safetyTopics: ("lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing")[];
            /** @enum {string|null} */
            skillLevel: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            /** @example 90 */
            estimatedMinutes: number | null;
        };
        StandardCautionDto: {
            /** @enum {string} */
            topic: "lifting" | "rotating_parts" | "high_voltage" | "welding" | "pressing";
            /** @enum {string} */
            level: "DANGER" | "WARNING" | "CAUTION" | "NOTICE";
            /** @example A jack is not a support. Raise the vehicle at the maker’s lifting points on firm, level ground and hold it on rated stands or a lift with its locks engaged before going underneath. */
            text: string;
        };
        PublishedFootageDto: {
            /** Format: uuid */
            id: string;
            /** @example Coupler swap, bench camera */
            title: string;
            /** @example 412000 */
            durationMs: number | null;
            /**
             * @description Redirects to a short-lived link to a progressive file (HTTP Range works)
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/video
             */
            videoUrl: string;
            /** @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/poster */
            posterUrl: string | null;
            /**
             * @description WebVTT captions; null without a transcript
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/captions.vtt
             */
            captionsUrl: string | null;
            /**
             * @description HLS master playlist once the web versions are made
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/hls/master.m3u8
             */
            hlsUrl: string | null;
            /**
             * @description The H.264 MP4 once the web versions are made
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/video
             */
            mp4Url: string | null;
            /**
             * @description WebVTT thumbnails track for scrub previews
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/thumbnails.vtt
             */
            thumbnailsUrl: string | null;
            /**
             * @description Audio peaks (WaveformDto)
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/waveform
             */
            waveformUrl: string | null;
            /**
             * @description The picture as shown, after rotation
             * @example 1920
             */
            displayWidth: number | null;
            /** @example 1080 */
            displayHeight: number | null;
        };
        PublishedGuideStepDto: {
            /** Format: uuid */
            id: string;
            /** @example 1 */
            position: number;
            /** @example Pull the old coupler */
            title: string;
            /**
             * @description Cleaned rich text (HTML)
             * @example <p>Back off the clamp bolt two turns.</p>
             */
            body: string;
            /** Format: uuid */
            footageId: string | null;
            /** @example 95000 */
            startMs: number | null;
            /** @example 131000 */
            endMs: number | null;
            caution: components["schemas"]["GuideCautionDto"] | null;
            /** @example 15 */
            estimatedMinutes: number | null;
        };
        PublishedGuidePartDto: {
            /** @example CPL-21T-12 */
            partNumber: string;
            /** @example Northway Drive Parts */
            maker: string;
            /** @example 21-tooth motor coupler */
            title: string;
            /** @enum {string} */
            category: "coupler" | "shaft" | "joint" | "bearing" | "bore" | "plate" | "boot" | "seal" | "fastener" | "other";
            /**
             * @description Where the part sits in the assembly
             * @example motor side
             */
            position: string;
        };
        PublishedCheckEvidenceDto: {
            /** @enum {string} */
            kind: "mark" | "measurement" | "photo";
            /** @example Reading 12.02 mm */
            label: string;
            /**
             * @description Where it is in the guide’s footage; null when elsewhere
             * @example 95000
             */
            startMs: number | null;
            /**
             * @description A photo’s address (redirects to the image); photos only
             * @example /api/guides/hollow-lane-garage/swapping-the-motor-coupler/evidence/7d0f3c2a-5b1e-4f7a-9c41-2e8d6b0a1f35/photo
             */
            photoUrl?: string;
        };
        PublishedCheckDto: {
            /** Format: uuid */
            id: string;
            /** @example Coupler spline engages the motor shaft */
            title: string;
            state: components["schemas"]["FitCheckState"];
            required: boolean;
            /** @example Engagement 11.8 mm of 12 mm wanted */
            detail: string | null;
            /** Format: date-time */
            confirmedAt: string | null;
            /**
             * @description Only where the workshop shows member names; otherwise null
             * @example Rowan Hale
             */
            confirmedBy: string | null;
            evidence: components["schemas"]["PublishedCheckEvidenceDto"][];
        };
        PublishedChecklistDto: {
            /** @example Motor to gearbox coupling */
            assemblyName: string;
            /** @description The roll-up of the required checks */
            verdict: components["schemas"]["ChecklistVerdict"];
            checks: components["schemas"]["PublishedCheckDto"][];
        };
        FollowTargetRefDto: {
            /** Format: uuid */
            id: string;
            /** @example Hollow Lane Garage */
            label: string;
        };
        GuideFollowTargetsDto: {
            workshop: components["schemas"]["FollowTargetRefDto"];
            build: components["schemas"]["FollowTargetRefDto"];
            /** @description Null when the guide follows no assembly */
            assembly: components["schemas"]["FollowTargetRefDto"] | null;
        };
        PublishedGuideMarkDto: {
            /** Format: uuid */
            id: string;
            /** @enum {string} */
            kind: "part" | "measurement" | "check_evidence" | "step" | "caution" | "note";
            /** @example 95000 */
            startMs: number;
            /** @example 131000 */
            endMs: number | null;
            /** @example Clamp bolt backed off */
            label: string;
            /** Format: uuid */
            stepId: string | null;
            /** Format: uuid */
            fitCheckId: string | null;
        };
        PublishedGuideDto: {
            workshop: components["schemas"]["PublicWorkshopRefDto"];
            guide: components["schemas"]["PublishedGuideInfoDto"];
            revision: components["schemas"]["GuidePublishedRevisionDto"];
            /** @description Most severe first */
            cautions: components["schemas"]["StandardCautionDto"][];
            /** @example This guide records one workshop’s experience. It does not replace the vehicle or part manufacturer’s service information, local regulations and codes, or the judgement of a licensed professional. Work within your training. */
            disclaimer: string;
            /** @description Null without footage, or until it is ready */
            footage: components["schemas"]["PublishedFootageDto"] | null;
            /** @description By position */
            steps: components["schemas"]["PublishedGuideStepDto"][];
            parts: components["schemas"]["PublishedGuidePartDto"][];
            /** @description Null when the guide follows no assembly */
            checklist: components["schemas"]["PublishedChecklistDto"] | null;
            followTargets: components["schemas"]["GuideFollowTargetsDto"];
            /** @description By start */
            marks: components["schemas"]["PublishedGuideMarkDto"][];
        };
        CueWindowResponseDto: {
            /** @description How many cues the whole transcript has (to size a list before its rows arrive) */
            total: number;
            /** @description The cues in the window, in order (at most 500) */
            cues: components["schemas"]["CueDto"][];
        };
        PublicRevisionGuideRefDto: {
            workshopName: string;
            workshopSlug: string;
            guideSlug: string;
            /** @description The title of the revision readers see today */
            title: string;
        };
        PublicRevisionSummaryDto: {
            /** @example 2 */
            number: number;
            /** Format: date-time */
            publishedAt: string;
            /** @example Added the boot clamp step */
            note: string;
            /** @description The revision readers see today */
            current: boolean;
        };
        PublicRevisionListDto: {
            guide: components["schemas"]["PublicRevisionGuideRefDto"];
            /** @example 4 */
            currentRevision: number;
            /** @description Newest first; never a revision newer than the one published */
            revisions: components["schemas"]["PublicRevisionSummaryDto"][];
        };
        RevisionRefDto: {
            number: number;
            /** Format: date-time */
            publishedAt: string;
            note: string;
        };
        /** @enum {string} */
        RevisionGuideField: "title" | "summary" | "tools" | "consumables";
        /**
         * @description Words both revisions have, or only the newer (added) or the older (removed)
         * @enum {string}
         */
        TextPieceChange: "same" | "added" | "removed";
        TextPieceDto: {
            /** @description Words both revisions have, or only the newer (added) or the older (removed) */
            change: components["schemas"]["TextPieceChange"];
            text: string;
        };
        GuideFieldChangeDto: {
            field: components["schemas"]["RevisionGuideField"];
            before: string;
            after: string;
            /** @description For tools and consumables: one piece per item */
            pieces: components["schemas"]["TextPieceDto"][];
        };
        PlacedStepDto: {
            /** Format: uuid */
            id: string;
            title: string;
            /** @description Its number in the revision that has it */
            number: number;
        };
        MovedStepDto: {
            /** Format: uuid */
            id: string;
            title: string;
            fromNumber: number;
            toNumber: number;
        };
        /**
         * @description moment: where the step starts in the video; time: its estimate
         * @enum {string}
         */
        RevisionStepField: "title" | "body" | "caution" | "moment" | "time";
        StepFieldChangeDto: {
            /** @description moment: where the step starts in the video; time: its estimate */
            field: components["schemas"]["RevisionStepField"];
            /** @description Plain text in the older revision */
            before: string;
            after: string;
            pieces: components["schemas"]["TextPieceDto"][];
        };
        ChangedStepDto: {
            /** Format: uuid */
            id: string;
            title: string;
            fromNumber: number;
            toNumber: number;
            changes: components["schemas"]["StepFieldChangeDto"][];
        };
        ChecklistStateChangeDto: {
            /** Format: uuid */
            id: string;
            title: string;
            required: boolean;
            /** @description Null when the check was not on the checklist then */
            before: components["schemas"]["FitCheckState"] | null;
            after: components["schemas"]["FitCheckState"] | null;
            changed: boolean;
        };
        RevisionCompareDto: {
            guide: components["schemas"]["PublicRevisionGuideRefDto"];
            currentRevision: number;
            from: components["schemas"]["RevisionRefDto"];
            to: components["schemas"]["RevisionRefDto"];
            /** @description The guide’s own title, summary, tools and consumables */
            guideChanges: components["schemas"]["GuideFieldChangeDto"][];
            added: components["schemas"]["PlacedStepDto"][];
            removed: components["schemas"]["PlacedStepDto"][];
            /** @description Steps taken out of their order (the fewest that explain the new order) */
            moved: components["schemas"]["MovedStepDto"][];
            changed: components["schemas"]["ChangedStepDto"][];
            /** @description Steps in both, in order, with the same words */
            unchangedCount: number;
            /** @description Each check’s state when each revision was published */
            checklist: components["schemas"]["ChecklistStateChangeDto"][];
        };
        RevisionCautionDto: {
            /** @enum {string} */
            level: "DANGER" | "WARNING" | "CAUTION" | "NOTICE";
            text: string;
        };
        PublicRevisionStepDto: {
            /**
             * Format: uuid
             * @description Stable across revisions
             */
            id: string;
            /**
             * @description Counted from 1 in reading order
             * @example 1
             */
            number: number;
            title: string;
            /** @description Sanitized rich text as published */
            body: string;
            caution: components["schemas"]["RevisionCautionDto"] | null;
            startMs: number | null;
            endMs: number | null;
            estimatedMinutes: number | null;
        };
        RevisionCheckDto: {
            /** Format: uuid */
            id: string;
            title: string;
            required: boolean;
            /** @description The state when this revision was published */
            state: components["schemas"]["FitCheckState"];
        };
        PublicRevisionDto: {
            /** @example 2 */
            number: number;
            /** Format: date-time */
            publishedAt: string;
            note: string;
            /**
             * @description The revision readers see today; also how many revisions there are
             * @example 4
             */
            currentRevision: number;
            guide: components["schemas"]["PublicRevisionGuideRefDto"];
            /** @description The title this revision had */
            title: string;
            summary: string;
            tools: string[];
            consumables: string[];
            /** @enum {string|null} */
            skillLevel: "bench_starter" | "shop_regular" | "seasoned_fitter" | null;
            estimatedMinutes: number | null;
            steps: components["schemas"]["PublicRevisionStepDto"][];
            /** @description The verified-fit checklist as it stood when this revision was published (retired checks left out) */
            checklist: components["schemas"]["RevisionCheckDto"][];
        };
        GuideReadingDto: {
            /** @example 4 */
            currentRevision: number;
            /** @description The revision this reader last opened; null if never */
            lastReadRevision: number | null;
            /** Format: date-time */
            lastReadAt: string | null;
        };
        FollowWorkshopDto: {
            /** @example Hollow Lane Garage */
            name: string;
            /** @example hollow-lane-garage */
            slug: string;
        };
        FollowResponseDto: {
            /** Format: uuid */
            id: string;
            /** @enum {string} */
            targetKind: "workshop" | "build" | "assembly";
            /** Format: uuid */
            targetId: string;
            /**
             * @description The workshop's, build's or assembly's name; (removed) once it is gone
             * @example Van conversion drive line
             */
            label: string;
            /**
             * @description How its fit news is mailed
             * @enum {string}
             */
            delivery: "at_once" | "daily" | "weekly" | "paused";
            workshop: components["schemas"]["FollowWorkshopDto"];
            /** Format: date-time */
            createdAt: string;
        };
        CreateFollowDto: {
            /** @enum {string} */
            targetKind: "workshop" | "build" | "assembly";
            /** @description The id of the workshop, build or assembly (a published guide gives them as followTargets) */
            targetId: string;
        };
        UnsubscribeBodyDto: {
            token?: string;
            /** @description Stop this other follow instead: one of the `stillFollowing` the first answer listed (same token, no sign-in) */
            followId?: string;
            /**
             * @description this (default): what sent the mail; workshop: every follow and report news in its workshop; everything: all fit news
             * @enum {string}
             */
            scope?: "this" | "workshop" | "everything";
            /** @description Sent by mail clients on one-click unsubscribe; ignored */
            "List-Unsubscribe"?: string;
        };
        UnsubscribedFollowDto: {
            id: string;
            /** @enum {string} */
            targetKind: "workshop" | "build" | "assembly";
            targetId: string;
            label: string;
            /**
             * @example {
             *       "name": "Harrow Lane Garage",
             *       "slug": "harrow-lane"
             *     }
             */
            workshop: Record<string, never>;
            createdAt: string;
            /** @enum {string} */
            delivery: "at_once" | "daily" | "weekly" | "paused";
        };
        UnsubscribeResultDto: {
            /**
             * @description `already` when the link had been used before
             * @enum {string}
             */
            status: "unfollowed" | "already";
            /**
             * @description What stopped: the follow or the fit report the e-mail came through, a digest, the mail about new fit reports (members), all news from a workshop, or all fit news
             * @enum {string}
             */
            stopped: "follow" | "report" | "digest" | "fit_report_mail" | "workshop" | "everything";
            /** @description What the e-mail named: the followed workshop, build or assembly, or "your fit report" */
            label: string;
            /** @description The person's other follows that still bring news of the same assembly (closest first) */
            stillFollowing: components["schemas"]["UnsubscribedFollowDto"][];
        };
        FollowPreferenceDto: {
            id: string;
            /** @enum {string} */
            targetKind: "workshop" | "build" | "assembly";
            label: string;
            workshopName: string;
            /** @enum {string} */
            delivery: "at_once" | "daily" | "weekly" | "paused";
        };
        MailPreferencesDto: {
            /** @description The address mail goes to */
            email: string;
            /** @example UTC */
            timeZone: string;
            digestHour: number;
            digestWeekday: number;
            /** @enum {string} */
            fitReportMail: "at_once" | "off";
            /** @description Set when mail to the address is paused after repeated refusals */
            pausedAt: string | null;
            /** @description Why mail is paused: the mail server’s last answer */
            pausedNote: string | null;
            follows: components["schemas"]["FollowPreferenceDto"][];
        };
        FollowDeliveryChangeDto: {
            /**
             * @description at_once (default), daily or weekly digest, or paused
             * @enum {string}
             */
            delivery: "at_once" | "daily" | "weekly" | "paused";
            followId: string;
        };
        UpdateMailPreferencesDto: {
            /**
             * @description IANA time zone the digest hour is in
             * @example Europe/Berlin
             */
            timeZone?: string;
            /** @description Local hour the digests go out */
            digestHour?: number;
            /** @description Weekly digest day: 0 = Sunday … 6 = Saturday */
            digestWeekday?: number;
            /**
             * @description Workshop owners and editors: mail when a fit report arrives
             * @enum {string}
             */
            fitReportMail?: "at_once" | "off";
            /** @description true resumes mail paused after the address refused it */
            resume?: boolean;
            /** @description New delivery for some of your follows */
            follows?: components["schemas"]["FollowDeliveryChangeDto"][];
        };
        FollowDeliveryDto: {
            /**
             * @description at_once (default), daily or weekly digest, or paused
             * @enum {string}
             */
            delivery: "at_once" | "daily" | "weekly" | "paused";
        };
        ChangeDeliveryRecordDto: {
            /** @description The history entry of the change */
            changeId: string;
            /** @enum {string} */
            to: "confirmed" | "no_fit";
            changedAt: string;
            /** @description Followers whose mail server accepted the mail */
            told: number;
            /** @description Mails not sent yet (or being tried again) */
            pending: number;
            /** @description Mails refused or given up on */
            failed: number;
            /** @description Followers who get this change in their daily or weekly digest */
            inDigests: number;
            firstSentAt: string | null;
            lastSentAt: string | null;
            /** @description What the refusing mail servers answered (addresses are not shown) */
            refusals: string[];
        };
        CheckFitNewsSummaryDto: {
            checkId: string;
            checkTitle: string;
            assemblyId: string;
            assemblyName: string;
            /** @description Changes of the check that were news (confirmed, no fit) */
            changes: number;
            /**
             * @description What the latest news change was
             * @enum {string}
             */
            lastChangeTo: "confirmed" | "no_fit";
            lastChangedAt: string;
            /** @description Mails the followers’ servers accepted (one per follower per change) */
            told: number;
            /** @description Mails not sent yet (or being tried again) */
            pending: number;
            /** @description Mails refused or given up on */
            failed: number;
            /** @description Changes waiting in followers’ daily or weekly digests */
            inDigests: number;
            /** @description Mails whose relay stopped between handing them over and recording the answer: sent again with the same Message-ID, so a follower may hold two copies */
            uncertain: number;
            firstSentAt: string | null;
            lastSentAt: string | null;
        };
        BuildFitNewsRecordDto: {
            buildId: string;
            /** @description Different people told about at least one change of the build’s checks */
            followersTold: number;
            told: number;
            pending: number;
            failed: number;
            inDigests: number;
            uncertain: number;
            firstSentAt: string | null;
            lastSentAt: string | null;
            /** @description Checks with at least one news change, latest change first */
            checks: components["schemas"]["CheckFitNewsSummaryDto"][];
        };
        CreateFitReportDto: {
            /** @enum {string} */
            outcome: "fit" | "no_fit";
            /** @example HL-2107 coupler on the original 5-speed input shaft, BD adapter plate */
            parts: string;
            /** @example 1986 compact pickup, 4x2 */
            vehicle?: string;
            notes?: string;
        };
        FitReportCheckDto: {
            /** Format: uuid */
            id: string;
            /** @example Test-fitted on the vehicle: coupler engages fully */
            title: string;
            state: components["schemas"]["FitCheckState"];
            /** @example 21-tooth coupler */
            assemblyName: string;
        };
        FitReportGuideDto: {
            /** @example Swapping the motor coupler */
            title: string;
            /**
             * @description The public guide's path in the studio
             * @example /guides/hollow-lane-garage/swapping-the-motor-coupler
             */
            path: string;
        };
        FitReportBuildDto: {
            /** Format: uuid */
            id: string;
            /** @example Van conversion drive line */
            title: string;
        };
        FitReportWorkshopDto: {
            /** @example Hollow Lane Garage */
            name: string;
            /** @example hollow-lane-garage */
            slug: string;
        };
        FitReportReporterDto: {
            /** @example Rowan Hale */
            displayName: string;
        };
        FitReportPhotoDto: {
            /** Format: uuid */
            id: string;
            /**
             * @description Address on this API (the reporter's or the workshop's route) that redirects to a short-lived storage link
             * @example /api/fit-reports/3b1f…/photos/9e2c…
             */
            url: string;
        };
        FitReportResponseDto: {
            /** Format: uuid */
            id: string;
            /** @enum {string} */
            outcome: "fit" | "no_fit";
            /** @example HL-2107 coupler with the DS-540 shaft */
            parts: string;
            /** @example 2009 panel van, 2.2 diesel */
            vehicle: string;
            /** @example Slid on by hand, no play. */
            notes: string;
            /** @enum {string} */
            status: "new" | "investigating" | "verified" | "declined";
            /**
             * @description The workshop's word to the reporter
             * @example
             */
            creatorNote: string;
            /** @description The fit check that verifies the claim */
            fitCheck: components["schemas"]["FitReportCheckDto"] | null;
            /** @description Null once the guide is deleted or its workshop is gone */
            guide: components["schemas"]["FitReportGuideDto"] | null;
            build: components["schemas"]["FitReportBuildDto"];
            workshop: components["schemas"]["FitReportWorkshopDto"];
            reporter: components["schemas"]["FitReportReporterDto"];
            photos: components["schemas"]["FitReportPhotoDto"][];
            /** Format: date-time */
            createdAt: string;
            /** Format: date-time */
            updatedAt: string;
        };
        UpdateFitReportDto: {
            /** @enum {string} */
            status?: "new" | "investigating" | "verified" | "declined";
            /** @description Shown to the reporter */
            creatorNote?: string;
            /**
             * Format: uuid
             * @description A fit check of this workshop that verifies the claim; null unties it
             */
            fitCheckId?: string | null;
        };
        FinderWorkshopDto: {
            name: string;
            slug: string;
        };
        FinderGuideDto: {
            title: string;
            slug: string;
            /** @example /guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack */
            path: string;
            revision: number;
            publishedAt: string;
        };
        FinderMeasurementDto: {
            /** @example OM-G5-IN pilot nose */
            feature: string;
            /**
             * @description as taken, in its unit and to its instrument’s resolution
             * @example 0.5902 in
             */
            value: string;
            /** @enum {string} */
            unit: "mm" | "um" | "in" | "thou" | "tenths";
            /** @description the same length in millimetres, exactly */
            millimetres: number;
            /** @example outside_micrometer */
            instrument: string;
            takenAt: string;
        };
        FinderCheckDto: {
            /** Format: uuid */
            id: string;
            /** @example Spline match: coupler to gearbox input */
            title: string;
            /**
             * @description which part of the query this check answers
             * @enum {string}
             */
            criterion: "spline" | "diameter" | "clearance" | "length" | "part";
            /** @enum {string} */
            state: "open" | "bench_pass" | "confirmed" | "no_fit";
            /** @enum {string} */
            verdict: "match" | "near_miss";
            /** @description why it matches, or what differs */
            reasons: string[];
            measurements: components["schemas"]["FinderMeasurementDto"][];
            confirmedAt: string | null;
            /** @description who confirmed it, when the workshop shows names publicly */
            confirmedBy: string | null;
            /** @description seconds into the guide’s video where the evidence is */
            evidenceAtSeconds: number | null;
        };
        FinderFitReportsDto: {
            /** @description readers’ reports that it fit (declined ones left out) */
            fit: number;
            /** @description readers’ reports that it did not fit */
            noFit: number;
        };
        FitFinderResultDto: {
            /** @enum {string} */
            verdict: "match" | "near_miss";
            /**
             * @description the least proven state among the matching checks
             * @enum {string}
             */
            state: "confirmed" | "bench_pass" | "open" | "no_fit";
            workshop: components["schemas"]["FinderWorkshopDto"];
            guide: components["schemas"]["FinderGuideDto"];
            buildTitle: string;
            vehicle: string;
            /** @example 21-tooth coupler stack */
            assembly: string;
            checks: components["schemas"]["FinderCheckDto"][];
            fitReports: components["schemas"]["FinderFitReportsDto"];
            /**
             * @description opens the guide at the evidence moment
             * @example /guides/harrow-lane-garage/fitting-the-21-tooth-coupler-stack?t=41.5
             */
            link: string;
        };
        FitFinderAnswerDto: {
            /**
             * @description the query as understood
             * @example [
             *       "spline: 21 teeth, 16/32 diametral pitch (ANSI B92.1)"
             *     ]
             */
            understood: string[];
            /** @description matching results in all (among the best-ranked 1,000 candidates per criterion: see totalCapped) */
            total: number;
            /** @description true when a criterion had more candidates than the finder judges (1,000): total counts the best-ranked of them, and more may match */
            totalCapped: boolean;
            offset: number;
            limit: number;
            /** @description confirmed first, then bench-passed, then open */
            results: components["schemas"]["FitFinderResultDto"][];
            /** @description near misses in all (among the best-ranked 200 near-miss candidates: see nearMissCapped) */
            nearMissTotal: number;
            /** @description true when the near-miss candidates filled their window (200): more near misses may exist */
            nearMissCapped: boolean;
            /** @description the first near misses, each with its reason (same page size, from the start) */
            nearMisses: components["schemas"]["FitFinderResultDto"][];
        };
        SearchKindCountDto: {
            /** @enum {string} */
            kind: "guide" | "part" | "cue" | "build" | "footage" | "mark" | "fit_check" | "draft_guide";
            /** @description Hits of this kind, at most 1000; with capped, a lower bound */
            count: number;
            /** @description True when there may be more than count (show "1,000+"): the count stopped at its cap or at the best-ranked matches read */
            capped: boolean;
        };
        SnippetSegmentDto: {
            /** @description Plain text: draw it as text, never as HTML */
            text: string;
            /** @description True for a word the search matched (draw it highlighted) */
            match: boolean;
        };
        SearchWorkshopDto: {
            name: string;
            slug: string;
        };
        SearchHitDto: {
            /** @enum {string} */
            kind: "guide" | "part" | "cue" | "build" | "footage" | "mark" | "fit_check" | "draft_guide";
            /** @description Stable within its kind */
            id: string;
            /** @description True when the hit comes from a published guide; false for your own workshop records */
            published: boolean;
            /** @description What the hit belongs to: the guide, the part, the build… */
            title: string;
            /** @description Words around the match, matched words flagged */
            snippet: components["schemas"]["SnippetSegmentDto"][];
            workshop: components["schemas"]["SearchWorkshopDto"];
            /** @description The build's vehicle, when the hit belongs to a build */
            vehicle: string | null;
            /** @description Footage time of a cue or a mark, in milliseconds */
            startMs: number | null;
            /** @description A fit check's state */
            checkState: string | null;
            /**
             * @description Studio path that opens the hit; a cue opens the video at startMs (?t= seconds)
             * @example /guides/harrow-lane-garage/motor-coupler?t=42.0
             */
            link: string;
        };
        SearchResultsDto: {
            /** @description The words searched for */
            terms: string[];
            /** @description Part-number keys matched exactly or by prefix (letters and digits, upper case) */
            partNumbers: string[];
            /** @description Hits of the asked kind (or of every kind) in all; results holds at most `limit` */
            total: number;
            /** @description True when total is a lower bound (a count it adds up is capped): show it as "1,000+" */
            totalCapped: boolean;
            offset: number;
            limit: number;
            /** @description Hits per kind under the other filters, for the kind chips */
            counts: components["schemas"]["SearchKindCountDto"][];
            /** @description Best first */
            results: components["schemas"]["SearchHitDto"][];
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
    HealthController_check: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Every service answered */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HealthReportDto"];
                };
            };
            /** @description At least one check is down */
            503: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HealthReportDto"];
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
                    "application/json": components["schemas"]["MeResponseDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
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
                "application/json": components["schemas"]["RegisterDto"];
            };
        };
        responses: {
            /** @description Same answer whether or not the address had an account */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_login: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["LoginDto"];
            };
        };
        responses: {
            /** @description Signed in; the session cookie is set */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeResponseDto"];
                };
            };
            /** @description The e-mail address or password is incorrect (one answer for both) */
            401: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many attempts from this client address a minute, or (code `sign_in_paused`) too many failed sign-ins for this e-mail address: after five, each failure pauses it twice as long (30 s up to 15 min), known address or not */
            429: {
                headers: {
                    /** @description Seconds until this address may try again */
                    "Retry-After"?: number;
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_logout: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Signed out (also when there was no session) */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_verifyEmail: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["EmailTokenDto"];
            };
        };
        responses: {
            /** @description The address is confirmed */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeResponseDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_resendVerification: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_forgotPassword: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ForgotPasswordDto"];
            };
        };
        responses: {
            /** @description Same answer, after the same work, whether or not the address has an account: a job looks it up and mails a link */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_resetPassword: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ResetPasswordDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_changePassword: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ChangePasswordDto"];
            };
        };
        responses: {
            /** @description Changed; other browsers are signed out */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_changeEmail: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ChangeEmailDto"];
            };
        };
        responses: {
            /** @description A link was sent to the new address */
            202: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MessageDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AuthController_confirmEmail: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["EmailTokenDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeResponseDto"];
                };
            };
            /** @description Too many attempts from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    UsersController_updateProfile: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateProfileDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SessionUserDto"];
                };
            };
        };
    };
    WorkshopsController_listMine: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The caller's workshops with the caller's role */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WorkshopView"][];
                };
            };
        };
    };
    WorkshopsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateWorkshopDto"];
            };
        };
        responses: {
            /** @description Created; the caller is its owner */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WorkshopView"];
                };
            };
        };
    };
    WorkshopsController_get: {
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
                    "application/json": components["schemas"]["WorkshopView"];
                };
            };
        };
    };
    WorkshopsController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["DeleteWorkshopDto"];
            };
        };
        responses: {
            /** @description Deleted with all its data and files */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    WorkshopsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateWorkshopDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WorkshopView"];
                };
            };
        };
    };
    WorkshopsController_setLogo: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    logo: string;
                };
            };
        };
        responses: {
            /** @description PNG, JPEG or WebP, at most 2 MB */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WorkshopView"];
                };
            };
        };
    };
    WorkshopsController_removeLogo: {
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
        };
    };
    MembersController_list: {
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
                    "application/json": components["schemas"]["MemberView"][];
                };
            };
        };
    };
    MembersController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: string;
            };
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
        };
    };
    MembersController_changeRole: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ChangeRoleDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MemberView"];
                };
            };
        };
    };
    MembersController_transfer: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["TransferOwnershipDto"];
            };
        };
        responses: {
            /** @description The chosen member is owner; the caller is an editor */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MemberView"][];
                };
            };
        };
    };
    MembersController_leave: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Left the workshop (the last owner cannot) */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    WorkshopInvitationsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Invitations not yet accepted */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationView"][];
                };
            };
        };
    };
    WorkshopInvitationsController_invite: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateInvitationDto"];
            };
        };
        responses: {
            /** @description Invited; the link was e-mailed (valid 7 days) */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationView"];
                };
            };
            /** @description Already a member (already_member), or the address stopped invitations (invitations_stopped) */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    WorkshopInvitationsController_revoke: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                invitationId: string;
            };
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
        };
    };
    InvitationsController_preview: {
        parameters: {
            query: {
                /** @description The token from the invitation link */
                token: string;
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
                    "application/json": components["schemas"]["InvitationPreview"];
                };
            };
        };
    };
    InvitationsController_accept: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["InvitationTokenDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AcceptedInvitation"];
                };
            };
        };
    };
    InvitationsController_optOut: {
        parameters: {
            query: {
                /** @description The token from the link in an invitation mail */
                token: string;
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
                    "application/json": components["schemas"]["InvitationOptOutView"];
                };
            };
            /** @description Unknown token */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    InvitationsController_setOptOut: {
        parameters: {
            query: {
                /** @description The token from the link in an invitation mail */
                token: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["InvitationOptOutChangeDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InvitationOptOutView"];
                };
            };
            /** @description Unknown token */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AdminController_listUsers: {
        parameters: {
            query?: {
                /** @description Part of a name, e-mail address or web address */
                search?: string;
                page?: number;
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
                    "application/json": components["schemas"]["AdminUserPageDto"];
                };
            };
        };
    };
    AdminController_disableUser: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Cannot sign in any more; signed out everywhere */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AdminController_enableUser: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                userId: string;
            };
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
        };
    };
    AdminController_listWorkshops: {
        parameters: {
            query?: {
                /** @description Part of a name, e-mail address or web address */
                search?: string;
                page?: number;
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
                    "application/json": components["schemas"]["AdminWorkshopPageDto"];
                };
            };
        };
    };
    AdminController_disableWorkshop: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Members can still read it; nobody can change it */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AdminController_enableWorkshop: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
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
        };
    };
    ToolsController_fits: {
        parameters: {
            query: {
                /** @description Nominal size, in `unit` */
                size: number;
                unit: "mm" | "in";
                /** @description Hole tolerance class: upper-case letter(s) and IT grade */
                hole: string;
                /** @description Shaft tolerance class: lower-case letter(s) and IT grade */
                shaft: string;
                /** @description js/JS: `none` gives ±IT/2 as the current ISO 286-2 tables do; `even` rounds odd IT7–IT11 down to even (older practice) */
                jsRounding?: "none" | "even";
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
                    "application/json": components["schemas"]["FitLimitsDto"];
                };
            };
            /** @description Too many calculator requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    ToolsController_splines: {
        parameters: {
            query: {
                teeth: number;
                /** @description ANSI B92.1 diametral pitch written `16/32` or `20 DP`, or an ISO 4156 module written `m1.25` */
                pitch: string;
                /** @description Pressure angle, degrees */
                pressureAngle?: 30 | 37.5 | 45;
                /** @description Default: flat for 30°, fillet for 37.5° and 45° (which have fillet roots only) */
                root?: "flat" | "fillet";
                /** @description major: ANSI B92.1 30° flat-root major-diameter fit */
                fit?: "side" | "major";
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
                    "application/json": components["schemas"]["SplineDimensionsDto"];
                };
            };
            /** @description A field the standards do not define, named in the message */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many calculator requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    ToolsController_identifySpline: {
        parameters: {
            query: {
                teeth: number;
                /** @description Measured major (outside) diameter of a shaft's spline, in `unit`; give this or minorDiameter */
                majorDiameter?: number;
                /** @description Measured minor diameter (the bore) of a hub's spline, in `unit` */
                minorDiameter?: number;
                /** @description Unit of the reading */
                unit: "mm" | "in";
                /** @description The instrument's resolution in `unit`; default 0.01 mm or 0.001 in (a common caliper) */
                resolution?: number;
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
                    "application/json": components["schemas"]["SplineIdentificationDto"];
                };
            };
            /** @description Missing or impossible reading, unit or tooth count */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many calculator requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    ToolsController_extractMeasurements: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ExtractMeasurementsDto"];
            };
        };
        responses: {
            /** @description At most 1,000 measurements; `truncated` says when there were more */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ExtractedMeasurementsDto"];
                };
            };
            /** @description text missing, not a string, or longer than 200,000 characters */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many calculator requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    ToolsController_parseTranscript: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ParseTranscriptDto"];
            };
        };
        responses: {
            /** @description At most 5,000 cues; `truncated` says when there were more */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["ParsedTranscriptDto"];
                };
            };
            /** @description text missing, not a string, or longer than 1,000,000 characters */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description `{ message, line }` naming the first line the parser cannot accept */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many calculator requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    BuildsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["BuildResponseDto"][];
                };
            };
        };
    };
    BuildsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateBuildDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["BuildResponseDto"];
                };
            };
        };
    };
    BuildsController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
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
                    "application/json": components["schemas"]["BuildResponseDto"];
                };
            };
        };
    };
    BuildsController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deleted with its assemblies, footage and guides */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    BuildsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateBuildDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["BuildResponseDto"];
                };
            };
        };
    };
    DeletionImpactController_build: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
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
                    "application/json": components["schemas"]["DeletionImpactDto"];
                };
            };
            /** @description No such build in this workshop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    DeletionImpactController_assembly: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
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
                    "application/json": components["schemas"]["DeletionImpactDto"];
                };
            };
            /** @description No such assembly in this workshop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    DeletionImpactController_footage: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
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
                    "application/json": components["schemas"]["DeletionImpactDto"];
                };
            };
            /** @description No such footage in this workshop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PartsController_list: {
        parameters: {
            query?: {
                /** @description part number (spacing and dashes ignored), title or maker */
                q?: string;
                category?: "coupler" | "shaft" | "joint" | "bearing" | "bore" | "plate" | "boot" | "seal" | "fastener" | "other";
                /** @description only parts that have a feature of this kind */
                featureKind?: "spline" | "diameter" | "length" | "free";
                /** @description only parts with a spline of this tooth count */
                splineTeeth?: number;
            };
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["PartResponseDto"][];
                };
            };
        };
    };
    PartsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreatePartDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PartResponseDto"];
                };
            };
        };
    };
    PartsController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
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
                    "application/json": components["schemas"]["PartResponseDto"];
                };
            };
        };
    };
    PartsController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
            };
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
        };
    };
    PartsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdatePartDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PartResponseDto"];
                };
            };
        };
    };
    PartsController_addPhoto: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    photo: string;
                };
            };
        };
        responses: {
            /** @description The part with its photos */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PartResponseDto"];
                };
            };
        };
    };
    PartsController_photo: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
                photoId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the photo */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PartsController_removePhoto: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
                photoId: string;
            };
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
        };
    };
    PartsController_addFeature: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["FeatureInputDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SplineFeatureResponseDto"] | components["schemas"]["DiameterFeatureResponseDto"] | components["schemas"]["LengthFeatureResponseDto"] | components["schemas"]["FreeFeatureResponseDto"];
                };
            };
        };
    };
    PartsController_removeFeature: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
                featureId: string;
            };
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
        };
    };
    PartsController_updateFeature: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                partId: string;
                featureId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateFeatureDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["SplineFeatureResponseDto"] | components["schemas"]["DiameterFeatureResponseDto"] | components["schemas"]["LengthFeatureResponseDto"] | components["schemas"]["FreeFeatureResponseDto"];
                };
            };
        };
    };
    MeasurementsController_list: {
        parameters: {
            query?: {
                featureId?: string;
                interfaceId?: string;
            };
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["MeasurementListDto"];
                };
            };
        };
    };
    MeasurementsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateMeasurementDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MeasurementResponseDto"];
                };
            };
        };
    };
    MeasurementsController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                measurementId: string;
            };
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
        };
    };
    FitChecksController_checklist: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
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
                    "application/json": components["schemas"]["ChecklistResponseDto"];
                };
            };
        };
    };
    FitChecksController_createManual: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateManualCheckDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitCheckResponseDto"];
                };
            };
        };
    };
    FitChecksController_transition: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                checkId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["TransitionDto"];
            };
        };
        responses: {
            /** @description The check in its new state */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitCheckResponseDto"];
                };
            };
            /** @description Refused, nothing stored: `already_in_state` (a repeat, e.g. a double click; `state` is the state now), `state_changed` (not in `from` any more) or `transition_refused` (the rules forbid it) */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FitChecksController_addEvidence: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                checkId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["AddEvidenceDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["EvidenceResponseDto"];
                };
            };
        };
    };
    FitChecksController_addPhotoEvidence: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                checkId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    photo: string;
                };
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["EvidenceResponseDto"];
                };
            };
        };
    };
    FitChecksController_evidencePhoto: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                checkId: string;
                evidenceId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the photo */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FitChecksController_history: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                checkId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Oldest first */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitCheckEventResponseDto"][];
                };
            };
        };
    };
    FitChecksController_whatIf: {
        parameters: {
            query: {
                /** @description How much larger the replacement shaft is (negative: smaller) */
                delta: string;
                unit: "mm" | "um" | "in" | "thou" | "tenths";
            };
            header?: never;
            path: {
                workshopId: string;
                interfaceId: string;
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
                    "application/json": components["schemas"]["WhatIfResponseDto"];
                };
            };
        };
    };
    AssembliesController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
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
                    "application/json": components["schemas"]["AssemblyResponseDto"][];
                };
            };
        };
    };
    AssembliesController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateAssemblyDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssemblyResponseDto"];
                };
            };
        };
    };
    AssembliesController_detail: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
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
                    "application/json": components["schemas"]["AssemblyDetailDto"];
                };
            };
        };
    };
    AssembliesController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
            };
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
        };
    };
    AssembliesController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateAssemblyDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AssemblyResponseDto"];
                };
            };
        };
    };
    AssembliesController_placePart: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
                partId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PlacePartDto"];
            };
        };
        responses: {
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    AssembliesController_removePart: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
                partId: string;
            };
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
        };
    };
    AssembliesController_addInterface: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateInterfaceDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InterfaceResponseDto"];
                };
            };
        };
    };
    AssembliesController_removeInterface: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
                interfaceId: string;
            };
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
        };
    };
    AssembliesController_updateInterface: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                assemblyId: string;
                interfaceId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateInterfaceDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["InterfaceResponseDto"];
                };
            };
        };
    };
    FootageController_limits: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Accepted file types and sizes, for checks before any byte is sent */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FootageLimitsDto"];
                };
            };
        };
    };
    FootageController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
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
                    "application/json": components["schemas"]["FootageResponseDto"][];
                };
            };
        };
    };
    FootageController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateFootageDto"];
            };
        };
        responses: {
            /** @description Footage in state "uploading" and its part plan */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["CreateFootageResponseDto"];
                };
            };
            /** @description Storage is not answering (`code: storage_unavailable`); try again */
            503: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
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
                    "application/json": components["schemas"]["FootageResponseDto"];
                };
            };
        };
    };
    FootageController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deleted with its stored file, poster and transcripts */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_rename: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateFootageDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FootageResponseDto"];
                };
            };
        };
    };
    FootageController_playback: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description A short-lived link to the video (HTTP Range works for seeking) */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PlaybackResponseDto"];
                };
            };
            /** @description The footage is not ready */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_uploadState: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The part plan and the finished parts, to resume an upload */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["UploadStateDto"];
                };
            };
            /** @description The upload is already finished */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_abort: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The multipart upload is cancelled and the footage deleted */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_signPartUrls: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PartUrlsRequestDto"];
            };
        };
        responses: {
            /** @description Presigned PUT URLs, valid for 15 minutes */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PartUrlsResponseDto"];
                };
            };
        };
    };
    FootageController_recordPart: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                partNumber: number;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["RecordPartDto"];
            };
        };
        responses: {
            /** @description The part is recorded as finished */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["RecordPartResponseDto"];
                };
            };
            /** @description The part number is outside the plan, or the ETag is not one storage gives a part */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageController_complete: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Assembled; the footage is now processing */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FootageResponseDto"];
                };
            };
            /** @description Parts are missing (listed in `missingParts`), or storage no longer has the upload */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Storage does not hold a recorded part as recorded (`invalidParts`); that record is dropped: upload the part again */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Storage is not answering (`code: storage_unavailable`); the upload is kept, try again */
            503: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_master: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description HLS master playlist; variant URIs are API paths */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.apple.mpegurl": string;
                };
            };
            /** @description No such footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_variant: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                variant: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description A rendition’s media playlist (`v0.m3u8` is the highest) with short-lived segment links */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.apple.mpegurl": string;
                };
            };
            /** @description No such footage or rendition, or the web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_thumbnails: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description WebVTT thumbnails track: each cue is a sprite-sheet link with #xywh=x,y,w,h */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/vtt": string;
                };
            };
            /** @description No such footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_waveform: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Audio peaks for drawing under the timeline */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WaveformDto"];
                };
            };
            /** @description No such footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_retry: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Queued again; earlier outputs are replaced, never doubled */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FootageResponseDto"];
                };
            };
            /** @description Not ready yet, already being made, or the original was dropped */
            409: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FootageMediaController_settings: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["MediaSettingsDto"];
                };
            };
        };
    };
    FootageMediaController_updateSettings: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["MediaSettingsDto"];
            };
        };
        responses: {
            /** @description Applies to footage transcoded from now on */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MediaSettingsDto"];
                };
            };
        };
    };
    TranscriptsController_read: {
        parameters: {
            query?: {
                /** @description A revision number; the active revision when absent */
                revision?: number;
            };
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The active revision (or `?revision=N`) with its cues */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TranscriptDto"];
                };
            };
        };
    };
    TranscriptsController_attach: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["AttachTranscriptDto"];
            };
        };
        responses: {
            /** @description Stored as the new active revision; earlier revisions are kept */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TranscriptDto"];
                };
            };
            /** @description `{ statusCode, message, line }` naming the first bad line */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    TranscriptsController_attachFile: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    file: string;
                    /** @enum {string} */
                    format?: "auto" | "webvtt" | "srt" | "timestamped";
                };
            };
        };
        responses: {
            /** @description A .vtt, .srt or .txt file of at most 2 MB (UTF-8 or UTF-16 with BOM) */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TranscriptDto"];
                };
            };
            /** @description `{ statusCode, message, line }` naming the first bad line */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    TranscriptsController_revisions: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Newest first */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["TranscriptRevisionDto"][];
                };
            };
        };
    };
    TranscriptsController_exportWebVtt: {
        parameters: {
            query?: {
                /** @description A revision number; the active revision when absent */
                revision?: number;
                /** @description Ask the browser to save the file instead of showing it */
                download?: boolean;
            };
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The transcript as a WebVTT file, for a `<track>` element or a download */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/vtt": string;
                };
            };
        };
    };
    TranscriptsController_searchFootage: {
        parameters: {
            query: {
                /** @description Words to find; each must appear (words of three letters or more) */
                q: string;
                limit?: number;
                /** @description How many hits to skip: the next page starts at offset + limit */
                offset?: number;
            };
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
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
                    "application/json": components["schemas"]["FootageSearchResponseDto"];
                };
            };
        };
    };
    TranscriptsController_hitMoments: {
        parameters: {
            query: {
                /** @description Words to find; each must appear (words of three letters or more) */
                q: string;
            };
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Where every hit starts, for the density band on the marking timeline */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["HitMomentsResponseDto"];
                };
            };
        };
    };
    TranscriptsController_searchWorkshop: {
        parameters: {
            query: {
                /** @description Words to find; each must appear (words of three letters or more) */
                q: string;
                limit?: number;
                /** @description How many hits to skip: the next page starts at offset + limit */
                offset?: number;
            };
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["WorkshopSearchResponseDto"];
                };
            };
        };
    };
    MarksController_list: {
        parameters: {
            query?: {
                /** @description At most this many (all when absent) */
                limit?: number;
                /** @description How many to skip: the next page starts at offset + limit */
                offset?: number;
                kind?: "part" | "measurement" | "check_evidence" | "step" | "caution" | "note";
            };
            header?: {
                /** @description How many marks there are in all (set on the answer) */
                "X-Total-Count"?: string;
            };
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description By start time */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MarkResponseDto"][];
                };
            };
        };
    };
    MarksController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateMarkDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MarkResponseDto"];
                };
            };
        };
    };
    MarksController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                markId: string;
            };
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
        };
    };
    MarksController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                markId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateMarkDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MarkResponseDto"];
                };
            };
        };
    };
    MarksController_suggestions: {
        parameters: {
            query?: {
                /** @description At most this many (all when absent) */
                limit?: number;
                /** @description How many to skip: the next page starts at offset + limit */
                offset?: number;
                status?: "pending" | "accepted" | "dismissed";
            };
            header?: {
                /** @description How many suggestions there are in all (set on the answer) */
                "X-Total-Count"?: string;
            };
            path: {
                workshopId: string;
                footageId: string;
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
                    "application/json": components["schemas"]["MarkSuggestionResponseDto"][];
                };
            };
        };
    };
    MarksController_accept: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                suggestionId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["AcceptSuggestionDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["AcceptedSuggestionResponseDto"];
                };
            };
        };
    };
    MarksController_dismiss: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                footageId: string;
                suggestionId: string;
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
                    "application/json": components["schemas"]["MarkSuggestionResponseDto"];
                };
            };
        };
    };
    GuidesController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
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
                    "application/json": components["schemas"]["GuideSummaryDto"][];
                };
            };
        };
    };
    GuidesController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                buildId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateGuideDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideResponseDto"];
                };
            };
        };
    };
    GuidesController_stepChoices: {
        parameters: {
            query?: {
                /** @description Only steps anchored in this footage */
                footageId?: string;
            };
            header?: never;
            path: {
                workshopId: string;
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
                    "application/json": components["schemas"]["GuideStepChoiceDto"][];
                };
            };
        };
    };
    GuidesController_get: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
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
                    "application/json": components["schemas"]["GuideResponseDto"];
                };
            };
        };
    };
    GuidesController_remove: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Deleted with its steps and revisions */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuidesController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateGuideDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideResponseDto"];
                };
            };
        };
    };
    GuidesController_addStep: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateStepDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideStepResponseDto"];
                };
            };
        };
    };
    GuidesController_reorderSteps: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["ReorderStepsDto"];
            };
        };
        responses: {
            /** @description The guide with its steps in the new order */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideResponseDto"];
                };
            };
        };
    };
    GuidesController_removeStep: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
                stepId: string;
            };
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
        };
    };
    GuidesController_updateStep: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
                stepId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateStepDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideStepResponseDto"];
                };
            };
        };
    };
    GuidesController_revisions: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Newest first */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideRevisionResponseDto"][];
                };
            };
        };
    };
    GuidesController_publish: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["PublishRevisionDto"];
            };
        };
        responses: {
            /** @description The new revision (publishedBy is not filled in here) */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideRevisionResponseDto"];
                };
            };
            /** @description The guide has no steps yet */
            422: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuidesController_withdraw: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                guideId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Withdrawn from public view; its revisions are kept */
            204: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_index: {
        parameters: {
            query?: {
                /** @description Words of the title, build or workshop */
                q?: string;
            };
            header?: {
                /** @description An ETag of Published guides, newest first (at most 50) from an earlier answer */
                "If-None-Match"?: string;
            };
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Published guides, newest first (at most 50) */
            200: {
                headers: {
                    /** @description Strong tag of the published revision and the live checklist it shows */
                    ETag?: string;
                    /** @description public, max-age=30, stale-while-revalidate=300 */
                    "Cache-Control"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublishedGuideSummaryDto"][];
                };
            };
            /** @description Unchanged since the ETag given in If-None-Match; no body */
            304: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_read: {
        parameters: {
            query?: never;
            header?: {
                /** @description An ETag of The follow-along content: the published revision with the live verified-fit checklist from an earlier answer */
                "If-None-Match"?: string;
            };
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The follow-along content: the published revision with the live verified-fit checklist */
            200: {
                headers: {
                    /** @description Strong tag of the published revision and the live checklist it shows */
                    ETag?: string;
                    /** @description public, max-age=30, stale-while-revalidate=300 */
                    "Cache-Control"?: string;
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublishedGuideDto"];
                };
            };
            /** @description Unchanged since the ETag given in If-None-Match; no body */
            304: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No such guide, or it is not published */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_video: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the footage */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_poster: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the poster image */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_evidencePhoto: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
                evidenceId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the photo */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description No such photo in the published guide’s live checklist */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_captions: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The guide's captions as a WebVTT file, for a `<track>` element */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/vtt": string;
                };
            };
        };
    };
    PublishedGuidesController_hlsMaster: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description HLS master playlist of the guide’s footage; variant URIs are API paths */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.apple.mpegurl": string;
                };
            };
            /** @description Not published, no footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_hlsVariant: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
                variant: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description A rendition’s media playlist (`v0.m3u8` is the highest) with short-lived segment links */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/vnd.apple.mpegurl": string;
                };
            };
            /** @description Not published, no such rendition, or the web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_thumbnails: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description WebVTT thumbnails track: each cue is a sprite-sheet link with #xywh=x,y,w,h */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "text/vtt": string;
                };
            };
            /** @description Not published, no footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedGuidesController_waveform: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Audio peaks of the guide’s footage */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["WaveformDto"];
                };
            };
            /** @description Not published, no footage, or its web versions are not ready */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    PublishedTranscriptController_cues: {
        parameters: {
            query?: {
                /** @description Cues still playing at or after this time, ms */
                fromMs?: number;
                /** @description Cues starting before this time, ms (after fromMs) */
                toMs?: number;
                /** @description First cue by position, from 0 */
                fromIndex?: number;
                /** @description How many cues from fromIndex */
                limit?: number;
            };
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The cues in a stretch of time (fromMs, toMs) or of positions (fromIndex, limit) */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["CueWindowResponseDto"];
                };
            };
            /** @description Neither or both pairs given, or toMs not after fromMs */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Not published, no footage, or no transcript */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuideRevisionsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
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
                    "application/json": components["schemas"]["PublicRevisionListDto"];
                };
            };
            /** @description No such guide, or it is not published */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuideRevisionsController_compare: {
        parameters: {
            query: {
                /** @description The older revision (any published revision number) */
                from: number;
                /** @description The newer revision */
                to: number;
            };
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
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
                    "application/json": components["schemas"]["RevisionCompareDto"];
                };
            };
            /** @description from or to missing or not a whole number */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description The guide is not published, or it has no such revision (errors names from or to) */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuideRevisionsController_revision: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
                number: number;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The revision as published, read-only, with the checklist as it stood then */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["PublicRevisionDto"];
                };
            };
            /** @description number is not a whole number from 1 */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description The guide is not published, or it has no such revision */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuideRevisionsController_reading: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The revision this reader last opened, beside the current one */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideReadingDto"];
                };
            };
            /** @description No such guide, or it is not published */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    GuideRevisionsController_recordReading: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Recorded: this reader has opened the current revision */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["GuideReadingDto"];
                };
            };
            /** @description No such guide, or it is not published */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FollowsController_list: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The caller's follows */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FollowResponseDto"][];
                };
            };
        };
    };
    FollowsController_follow: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateFollowDto"];
            };
        };
        responses: {
            /** @description Already followed: the existing follow, unchanged */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FollowResponseDto"];
                };
            };
            /** @description A new follow */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FollowResponseDto"];
                };
            };
            /** @description The target is neither in a published guide nor in one of your workshops */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FollowsController_unsubscribe: {
        parameters: {
            query?: {
                token?: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UnsubscribeBodyDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["UnsubscribeResultDto"];
                };
            };
            /** @description Unknown token, or a followId this link cannot stop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FollowsController_getPreferences: {
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
                    "application/json": components["schemas"]["MailPreferencesDto"];
                };
            };
        };
    };
    FollowsController_updatePreferences: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateMailPreferencesDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MailPreferencesDto"];
                };
            };
        };
    };
    FollowsController_getPreferencesByLink: {
        parameters: {
            query: {
                /** @description The token from a mail’s preferences or unsubscribe link */
                token: string;
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
                    "application/json": components["schemas"]["MailPreferencesDto"];
                };
            };
            /** @description Unknown token */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FollowsController_updatePreferencesByLink: {
        parameters: {
            query: {
                /** @description The token from a mail’s preferences or unsubscribe link */
                token: string;
            };
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateMailPreferencesDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MailPreferencesDto"];
                };
            };
            /** @description Unknown token */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FollowsController_unfollow: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                followId: string;
            };
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
        };
    };
    FollowsController_setDelivery: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                followId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["FollowDeliveryDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["MailPreferencesDto"];
                };
            };
        };
    };
    FitNewsRecordController_forCheck: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                checkId: string;
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
                    "application/json": components["schemas"]["ChangeDeliveryRecordDto"][];
                };
            };
        };
    };
    FitNewsRecordController_retry: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                checkId: string;
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
                    "application/json": components["schemas"]["ChangeDeliveryRecordDto"][];
                };
            };
        };
    };
    BuildFitNewsRecordController_forBuild: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                buildId: string;
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
                    "application/json": components["schemas"]["BuildFitNewsRecordDto"];
                };
            };
            /** @description No such build in this workshop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    BuildFitNewsRecordController_retry: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                buildId: string;
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
                    "application/json": components["schemas"]["BuildFitNewsRecordDto"];
                };
            };
            /** @description No such build in this workshop */
            404: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FitReportsController_create: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopSlug: string;
                guideSlug: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["CreateFitReportDto"];
            };
        };
        responses: {
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitReportResponseDto"];
                };
            };
            /** @description More than 10 reports from this person in the last hour */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FitReportsController_mine: {
        parameters: {
            query?: never;
            header?: never;
            path?: never;
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description The caller's own reports, newest first */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitReportResponseDto"][];
                };
            };
        };
    };
    FitReportsController_addPhoto: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                reportId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "multipart/form-data": {
                    /** Format: binary */
                    photo: string;
                };
            };
        };
        responses: {
            /** @description The report with its photos */
            201: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitReportResponseDto"];
                };
            };
        };
    };
    FitReportsController_photo: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                reportId: string;
                photoId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the photo */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    WorkshopFitReportsController_list: {
        parameters: {
            query?: {
                status?: "new" | "investigating" | "verified" | "declined";
            };
            header?: never;
            path: {
                workshopId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Newest first */
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitReportResponseDto"][];
                };
            };
        };
    };
    WorkshopFitReportsController_update: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                reportId: string;
            };
            cookie?: never;
        };
        requestBody: {
            content: {
                "application/json": components["schemas"]["UpdateFitReportDto"];
            };
        };
        responses: {
            200: {
                headers: {
                    [name: string]: unknown;
                };
                content: {
                    "application/json": components["schemas"]["FitReportResponseDto"];
                };
            };
        };
    };
    WorkshopFitReportsController_photo: {
        parameters: {
            query?: never;
            header?: never;
            path: {
                workshopId: string;
                reportId: string;
                photoId: string;
            };
            cookie?: never;
        };
        requestBody?: never;
        responses: {
            /** @description Redirects to a short-lived link to the photo */
            302: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    FitFinderController_find: {
        parameters: {
            query?: {
                /** @description part number; spacing and dashes ignored */
                partNumber?: string;
                maker?: string;
                /** @description words of the build’s vehicle */
                vehicle?: string;
                /** @description spline tooth count */
                splineTeeth?: number;
                /** @description diametral pitch (16/32, 20 DP) or module (m1.25) */
                splinePitch?: string;
                /** @description degrees */
                pressureAngle?: 30 | 37.5 | 45;
                splineFit?: "side" | "major";
                /** @description a diameter: a length such as 0.750 in, 19.05 mm, 3/4" or 15 thou */
                diameter?: string;
                /** @description ISO 286 class of the diameter (H7 a bore, g6 a shaft); without it the diameter is a measured size */
                toleranceClass?: string;
                /** @description the fit you want at that diameter: bore/shaft interfaces are judged by their clearance */
                fit?: string;
                /** @description shortest installed length: a length such as 0.750 in, 19.05 mm, 3/4" or 15 thou */
                lengthMin?: string;
                /** @description longest installed length */
                lengthMax?: string;
                /** @description unit for lengths written without one */
                unit?: "mm" | "um" | "in" | "thou" | "tenths";
                limit?: number;
                offset?: number;
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
                    "application/json": components["schemas"]["FitFinderAnswerDto"];
                };
            };
            /** @description Nothing to look for, or a field that cannot be read (named in the message) */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
    SearchController_search: {
        parameters: {
            query: {
                /** @description Words to find (each must appear; three letters or more) or a part number (exact or prefix, hyphens ignored) */
                q: string;
                /** @description Only this kind of hit */
                kind?: "guide" | "part" | "cue" | "build" | "footage" | "mark" | "fit_check" | "draft_guide";
                /** @description A workshop's slug: only its hits */
                workshop?: string;
                /** @description published: public hits only; unpublished: your own workshop records only */
                state?: "published" | "unpublished";
                /** @description Only hits with a fit check in this state: published guides whose assembly has such a check, and (members) their fit checks in it. Kinds that carry no check (builds, footage, marks, drafts, a member's own parts and cues) give no hits under it */
                checkState?: "open" | "bench_pass" | "confirmed" | "no_fit";
                /** @description Words the build's vehicle must contain */
                vehicle?: string;
                offset?: number;
                limit?: number;
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
                    "application/json": components["schemas"]["SearchResultsDto"];
                };
            };
            /** @description A filter out of range, or a query with nothing to search for; the message names the field */
            400: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
            /** @description Too many requests from this address; wait a minute */
            429: {
                headers: {
                    [name: string]: unknown;
                };
                content?: never;
            };
        };
    };
}
